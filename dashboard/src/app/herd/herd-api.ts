import { HttpClient, httpResource } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, map } from 'rxjs';
import * as z from 'zod';
import { Animal, CreateAnimalRequest, HerdLines, HerdPage, UpdateAnimalRequest } from '@shared/contracts/animals';
import type { Sex } from '@shared/domain/terms';
import { herdApiParams, type HerdView } from './herd-view';

export type NewAnimal = z.input<typeof CreateAnimalRequest>;
export type AnimalChange = z.input<typeof UpdateAnimalRequest>;

export const animalsUrl = (rabbitryId: string) => `/api/rabbitries/${encodeURIComponent(rabbitryId)}/animals`;

/** The herd as a collection: its table, parent look-ups and the animal records' own writes. */
@Injectable({ providedIn: 'root' })
export class HerdApi {
  private readonly http = inject(HttpClient);

  page(rabbitryId: () => string, view: () => HerdView) {
    return httpResource(() => ({ url: animalsUrl(rabbitryId()), params: herdApiParams(view()) }), {
      parse: (body) => HerdPage.parse(body),
    });
  }

  /** The herd's lines with their animal counts, for the line filter and the line field. */
  lines(rabbitryId: () => string) {
    return httpResource(() => `/api/rabbitries/${encodeURIComponent(rabbitryId())}/lines`, { parse: (body) => HerdLines.parse(body).lines });
  }

  /** Up to 8 animals of a sex whose ear ID or name holds the text, outside parents included. */
  parentsMatching(rabbitryId: () => string, sex: Sex, text: () => string) {
    return httpResource(
      () => {
        const q = text().trim();
        if (q === '') return undefined;
        return { url: animalsUrl(rabbitryId()), params: { q, sex, stubs: 'include', pageSize: 8 } };
      },
      { parse: (body) => HerdPage.parse(body).rows },
    );
  }

  create(rabbitryId: string, animal: NewAnimal): Observable<Animal> {
    return this.http.post(animalsUrl(rabbitryId), animal).pipe(map((body) => Animal.parse(body)));
  }

  update(rabbitryId: string, animalId: number, change: AnimalChange): Observable<Animal> {
    return this.http.patch(`${animalsUrl(rabbitryId)}/${animalId}`, change).pipe(map((body) => Animal.parse(body)));
  }
}

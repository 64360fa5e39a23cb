import { HttpClient, httpResource } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, map } from 'rxjs';
import * as z from 'zod';
import { BreedRecord } from '@shared/contracts/breeds';
import type { Breed } from '@shared/domain/breed';

const BreedList = z.object({ breeds: z.array(BreedRecord) });
/** What the catalogue editor sends: a whole breed (the API derives the key from the name). */
export type BreedChange = Omit<Breed, 'key'>;

/** The breed catalogue: everyone signed in reads it (forms, profiles), administrators edit it. */
@Injectable({ providedIn: 'root' })
export class BreedsApi {
  private readonly http = inject(HttpClient);

  list() {
    return httpResource(() => '/api/breeds', { parse: (body) => BreedList.parse(body).breeds });
  }

  create(breed: BreedChange): Observable<BreedRecord> {
    return this.http.post('/api/breeds', breed).pipe(map((body) => BreedRecord.parse(body)));
  }

  update(id: number, breed: BreedChange): Observable<BreedRecord> {
    return this.http.patch(`/api/breeds/${id}`, breed).pipe(map((body) => BreedRecord.parse(body)));
  }

  remove(id: number): Observable<void> {
    return this.http.delete<void>(`/api/breeds/${id}`);
  }
}

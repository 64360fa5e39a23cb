import { HttpClient, httpResource } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, map } from 'rxjs';
import * as z from 'zod';
import { AnimalSummary } from '@shared/contracts/animals';
import { AddKitsRequest, CreateLitterRequest, Litter, UpdateLitterRequest } from '@shared/contracts/litters';

const LitterList = z.object({ litters: z.array(Litter), caution: z.string() });
const KitList = z.object({ kits: z.array(AnimalSummary) });
export type NewLitter = z.input<typeof CreateLitterRequest>;
export type LitterChange = z.input<typeof UpdateLitterRequest>;
export type NewKits = z.input<typeof AddKitsRequest>;

export const littersUrl = (rabbitryId: string) => `/api/rabbitries/${encodeURIComponent(rabbitryId)}/litters`;

/** A rabbitry's litters and the kits recorded from them. */
@Injectable({ providedIn: 'root' })
export class LittersApi {
  private readonly http = inject(HttpClient);

  list(rabbitryId: () => string) {
    return httpResource(() => littersUrl(rabbitryId()), { parse: (body) => LitterList.parse(body) });
  }

  create(rabbitryId: string, litter: NewLitter): Observable<Litter> {
    return this.http.post(littersUrl(rabbitryId), litter).pipe(map((body) => Litter.parse(body)));
  }

  update(rabbitryId: string, litterId: number, change: LitterChange): Observable<Litter> {
    return this.http.patch(`${littersUrl(rabbitryId)}/${litterId}`, change).pipe(map((body) => Litter.parse(body)));
  }

  addKits(rabbitryId: string, litterId: number, kits: NewKits): Observable<AnimalSummary[]> {
    return this.http.post(`${littersUrl(rabbitryId)}/${litterId}/kits`, kits).pipe(map((body) => KitList.parse(body).kits));
  }
}

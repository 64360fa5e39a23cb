import { HttpClient, httpResource } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import * as z from 'zod';
import { Show, ShowDetail, ShowResult } from '@shared/contracts/shows';

const ShowList = z.object({ shows: z.array(Show) });
const ResultList = z.object({ results: z.array(ShowResult) });

export const showsUrl = (clubId: string) => `/api/clubs/${encodeURIComponent(clubId)}/shows`;

/** A club's shows and their results; results come in through imports, officers remove them. */
@Injectable({ providedIn: 'root' })
export class ShowsApi {
  private readonly http = inject(HttpClient);

  list(clubId: () => string) {
    return httpResource(() => showsUrl(clubId()), { parse: (body) => ShowList.parse(body).shows });
  }

  /** One show with its counts and who judged how many classes. */
  one(clubId: () => string, showId: () => string) {
    return httpResource(() => `${showsUrl(clubId())}/${encodeURIComponent(showId())}`, { parse: (body) => ShowDetail.parse(body) });
  }

  results(clubId: () => string, showId: () => string) {
    return httpResource(() => `${showsUrl(clubId())}/${encodeURIComponent(showId())}/results`, {
      parse: (body) => ResultList.parse(body).results,
    });
  }

  resultsCsvUrl(clubId: string, showId: string | number): string {
    return `${showsUrl(clubId)}/${encodeURIComponent(String(showId))}/results?format=csv`;
  }

  removeShow(clubId: string, showId: number, withResults: boolean): Observable<void> {
    return this.http.delete<void>(`${showsUrl(clubId)}/${showId}`, { params: { withResults } });
  }

  removeResult(clubId: string, showId: number, resultId: number): Observable<void> {
    return this.http.delete<void>(`${showsUrl(clubId)}/${showId}/results/${resultId}`);
  }
}

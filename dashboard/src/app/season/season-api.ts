import { HttpClient, httpResource } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, map } from 'rxjs';
import { SeasonReport, SeasonSettings, type SeasonSettingsRequest } from '@shared/contracts/analytics';

const clubUrl = (clubId: string) => `/api/clubs/${encodeURIComponent(clubId)}`;

/** The club season's report (every member) and its settings (officers write them). */
@Injectable({ providedIn: 'root' })
export class SeasonApi {
  private readonly http = inject(HttpClient);

  /** Without dates the API uses the club's own season. */
  report(clubId: () => string, range: () => { from: string | null; to: string | null }) {
    return httpResource(
      () => {
        const { from, to } = range();
        return { url: `${clubUrl(clubId())}/analytics/season`, params: { ...(from ? { from } : {}), ...(to ? { to } : {}) } };
      },
      { parse: (body) => SeasonReport.parse(body) },
    );
  }

  save(clubId: string, settings: SeasonSettingsRequest): Observable<SeasonSettings> {
    return this.http.put(`${clubUrl(clubId)}/season`, settings).pipe(map((body) => SeasonSettings.parse(body)));
  }
}

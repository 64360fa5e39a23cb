import { HttpClient, HttpEventType, httpResource } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable, filter, map } from 'rxjs';
import * as z from 'zod';
import { ImportJob, type ImportCheckOptions } from '@shared/contracts/imports';
import type { ImportKindKey } from '@shared/imports/import-kinds';

const ImportList = z.object({ imports: z.array(ImportJob) });

export type ImportScope = { kind: 'rabbitry' | 'club'; id: string };
export type UploadEvent = { progress: number } | { job: ImportJob };

export const importsUrl = (scope: ImportScope) =>
  `/api/${scope.kind === 'rabbitry' ? 'rabbitries' : 'clubs'}/${encodeURIComponent(scope.id)}/imports`;

/** The import wizard's calls, the same for a rabbitry's herd files and a club's result files. */
@Injectable({ providedIn: 'root' })
export class ImportsApi {
  private readonly http = inject(HttpClient);

  history(scope: () => ImportScope | null) {
    return httpResource(
      () => {
        const s = scope();
        return s ? importsUrl(s) : undefined;
      },
      { parse: (body) => ImportList.parse(body).imports },
    );
  }

  /** Uploads the file, reporting the share sent (0–100) and then the job the API made of it. */
  upload(scope: ImportScope, kind: ImportKindKey, file: File): Observable<UploadEvent> {
    const form = new FormData();
    form.append('kind', kind);
    form.append('file', file, file.name);
    return this.http.post(importsUrl(scope), form, { reportProgress: true, observe: 'events' }).pipe(
      filter((e) => e.type === HttpEventType.UploadProgress || e.type === HttpEventType.Response),
      map((e): UploadEvent =>
        e.type === HttpEventType.UploadProgress
          ? { progress: e.total ? Math.round((e.loaded / e.total) * 100) : 0 }
          : { job: ImportJob.parse((e as { body: unknown }).body) },
      ),
    );
  }

  get(scope: ImportScope, jobId: number): Observable<ImportJob> {
    return this.http.get(`${importsUrl(scope)}/${jobId}`).pipe(map((body) => ImportJob.parse(body)));
  }

  check(scope: ImportScope, jobId: number, options: ImportCheckOptions): Observable<ImportJob> {
    return this.http.post(`${importsUrl(scope)}/${jobId}/check`, options).pipe(map((body) => ImportJob.parse(body)));
  }

  commit(scope: ImportScope, jobId: number, skipRowsWithErrors: boolean): Observable<ImportJob> {
    return this.http.post(`${importsUrl(scope)}/${jobId}/commit`, { skipRowsWithErrors }).pipe(map((body) => ImportJob.parse(body)));
  }

  problemsUrl(scope: ImportScope, jobId: number): string {
    return `${importsUrl(scope)}/${jobId}/problems.csv`;
  }
}

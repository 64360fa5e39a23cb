import { httpResource } from '@angular/common/http';
import { Injectable } from '@angular/core';
import { LinesReport } from '@shared/contracts/analytics';
import { analyticsUrl } from '../panels/analytics-url';

/** Line comparison's read: every measure of the chosen grouping and filters at once (a few kilobytes), so switching measures is instant. */
@Injectable({ providedIn: 'root' })
export class LinesApi {
  report(rabbitryId: () => string, params: () => Record<string, string>) {
    return httpResource(
      () => ({ url: analyticsUrl(rabbitryId(), 'lines'), params: params() }),
      { parse: (body) => LinesReport.parse(body) },
    );
  }
}

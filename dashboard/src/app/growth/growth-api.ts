import { httpResource } from '@angular/common/http';
import { Injectable } from '@angular/core';
import { GrowthReport } from '@shared/contracts/analytics';
import { HerdPage } from '@shared/contracts/animals';
import { animalsUrl } from '../herd/herd-api';
import { analyticsUrl } from '../panels/analytics-url';
import { growthParams, type GrowthView } from './growth-view';

/** Growth bands and chosen animals' weighings; herd animals found by ear ID or name to add. */
@Injectable({ providedIn: 'root' })
export class GrowthApi {
  growth(rabbitryId: () => string, view: () => GrowthView) {
    return httpResource(() => ({ url: analyticsUrl(rabbitryId(), 'growth'), params: growthParams(view()) }), {
      parse: (body) => GrowthReport.parse(body),
    });
  }

  /** Up to 8 of the herd's own animals whose ear ID or name holds the text. */
  animalsMatching(rabbitryId: () => string, text: () => string) {
    return httpResource(
      () => {
        const q = text().trim();
        return q === '' ? undefined : { url: animalsUrl(rabbitryId()), params: { q, pageSize: 8 } };
      },
      { parse: (body) => HerdPage.parse(body).rows },
    );
  }
}

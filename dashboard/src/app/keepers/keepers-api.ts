import { httpResource } from '@angular/common/http';
import { Injectable } from '@angular/core';
import { KeepersReport } from '@shared/contracts/analytics';
import { keeperParams, type KeeperView } from './keeper-view';

export const analyticsUrl = (rabbitryId: string, report: string) =>
  `/api/rabbitries/${encodeURIComponent(rabbitryId)}/analytics/${report}`;

/** The keeper board's read; decisions are written through the animal's own API (AnimalApi). */
@Injectable({ providedIn: 'root' })
export class KeepersApi {
  ranking(rabbitryId: () => string, view: () => KeeperView) {
    return httpResource(() => ({ url: analyticsUrl(rabbitryId(), 'keepers'), params: keeperParams(view()) }), {
      parse: (body) => KeepersReport.parse(body),
    });
  }
}

import { httpResource } from '@angular/common/http';
import { Injectable } from '@angular/core';
import { KeepersReport } from '@shared/contracts/analytics';
import { analyticsUrl } from '../panels/analytics-url';
import { keeperParams, type KeeperView } from './keeper-view';

/** The keeper board's read; decisions are written through the animal's own API (AnimalApi). */
@Injectable({ providedIn: 'root' })
export class KeepersApi {
  ranking(rabbitryId: () => string, view: () => KeeperView) {
    return httpResource(() => ({ url: analyticsUrl(rabbitryId(), 'keepers'), params: keeperParams(view()) }), {
      parse: (body) => KeepersReport.parse(body),
    });
  }
}

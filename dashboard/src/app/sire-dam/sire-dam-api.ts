import { httpResource } from '@angular/common/http';
import { Injectable } from '@angular/core';
import { PlacementReport } from '@shared/contracts/analytics';
import { analyticsUrl } from '../panels/analytics-url';
import { sireDamParams, type SireDamView } from './sire-dam-view';

/** Placement of parents' offspring at shows. */
@Injectable({ providedIn: 'root' })
export class SireDamApi {
  placement(rabbitryId: () => string, view: () => SireDamView) {
    return httpResource(() => ({ url: analyticsUrl(rabbitryId(), 'placement'), params: sireDamParams(view()) }), {
      parse: (body) => PlacementReport.parse(body),
    });
  }
}

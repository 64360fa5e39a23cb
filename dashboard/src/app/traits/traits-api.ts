import { httpResource } from '@angular/common/http';
import { Injectable } from '@angular/core';
import { HeritabilityReport } from '@shared/contracts/analytics';
import { analyticsUrl } from '../panels/analytics-url';
import { traitParams, type TraitView } from './trait-view';

/** Heritability of a trait in the rabbitry, or pooled over every herd the user may see. */
@Injectable({ providedIn: 'root' })
export class TraitsApi {
  heritability(rabbitryId: () => string, view: () => TraitView) {
    return httpResource(() => ({ url: analyticsUrl(rabbitryId(), 'heritability'), params: traitParams(view()) }), {
      parse: (body) => HeritabilityReport.parse(body),
    });
  }
}

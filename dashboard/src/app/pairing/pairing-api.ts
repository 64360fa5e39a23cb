import { httpResource } from '@angular/common/http';
import { Injectable } from '@angular/core';
import { HerdPage } from '@shared/contracts/animals';
import { PairingsReport, RelationshipReport } from '@shared/contracts/analytics';
import { pairingParams, type PairingView } from './pairing-view';

const herdUrl = (rabbitryId: string) => `/api/rabbitries/${encodeURIComponent(rabbitryId)}`;

/** The pairing planner's reads: the herd's active animals to choose from, pairings, one pair's relationship. */
@Injectable({ providedIn: 'root' })
export class PairingApi {
  /** Up to 20 active herd animals whose ear ID or name holds the text (the first 20 by ear ID without text). */
  animalsMatching(rabbitryId: () => string, text: () => string) {
    return httpResource(
      () => {
        const q = text().trim();
        return { url: `${herdUrl(rabbitryId())}/animals`, params: { status: 'active', pageSize: 20, ...(q ? { q } : {}) } };
      },
      { parse: (body) => HerdPage.parse(body) },
    );
  }

  /** Candidate mates and the does × bucks grid; nothing is asked before an animal is chosen. */
  pairings(rabbitryId: () => string, view: () => PairingView) {
    return httpResource(
      () => (view().animal === null ? undefined : { url: `${herdUrl(rabbitryId())}/analytics/pairings`, params: pairingParams(view()) }),
      { parse: (body) => PairingsReport.parse(body) },
    );
  }

  /** How two animals are related and through which ancestors (a heatmap cell asked about). */
  relationship(rabbitryId: () => string, pair: () => { a: number; b: number } | null) {
    return httpResource(
      () => {
        const p = pair();
        return p ? { url: `${herdUrl(rabbitryId())}/analytics/relationship`, params: { a: p.a, b: p.b } } : undefined;
      },
      { parse: (body) => RelationshipReport.parse(body) },
    );
  }
}

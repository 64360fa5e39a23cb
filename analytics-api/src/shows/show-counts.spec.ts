import { describe, expect, it } from 'vitest';
import type { ShowResult } from '@shared/contracts/shows';
import { showCounts } from './show-counts';

const result = (over: Partial<ShowResult>): ShowResult => ({
  id: 1, showId: 4, showName: 'Winter Show', showDate: '2026-01-17', earId: 'A1', exhibitor: 'Larch Row', breed: 'Mini Rex', variety: 'Black',
  sex: 'buck', ageClass: 'junior', entriesInClass: 4, exhibitorsInClass: 3, placing: 1, awards: [], judge: null, matched: false,
  computedAgeClass: null, ageClassMismatch: false, ...over,
});

describe('showCounts', () => {
  it('counts classes, breeds and exhibitors once each, whatever the case of their names', () => {
    const results = [
      result({ placing: 1 }), result({ placing: 2, exhibitor: 'larch row', matched: true }),
      result({ sex: 'doe', exhibitor: 'Fen Gate', ageClassMismatch: true }),
      result({ breed: 'Holland Lop', variety: null, exhibitor: 'Fen Gate' }),
    ];
    expect(showCounts(results, []).counts).toEqual({ classes: 3, breeds: 2, exhibitors: 2, matched: 1, ageClassMismatches: 1 });
  });

  it('credits each judge with the classes and results judged; results without a judge go to the show’s judges', () => {
    const results = [
      result({ judge: 'R. Ambleforth' }), result({ judge: 'R. Ambleforth', placing: 2 }), result({ judge: 'R. Ambleforth', sex: 'doe' }),
      result({ breed: 'Holland Lop' }),
    ];
    expect(showCounts(results, ['T. Quill', 'M. Orr']).judging).toEqual([
      { judge: 'R. Ambleforth', classes: 2, results: 3 },
      { judge: 'T. Quill, M. Orr', classes: 1, results: 1 },
    ]);
    expect(showCounts([result({})], []).judging).toEqual([{ judge: null, classes: 1, results: 1 }]);
    expect(showCounts([], ['T. Quill'])).toEqual({ counts: { classes: 0, breeds: 0, exhibitors: 0, matched: 0, ageClassMismatches: 0 }, judging: [] });
  });
});

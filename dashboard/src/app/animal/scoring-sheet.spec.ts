import type { Evaluation } from '@shared/contracts/animals';
import { DEFAULT_EVALUATION_TRAITS } from '@shared/domain/breed';
import { scoreText, scoringSheet } from './scoring-sheet';

const evaluation = (id: number, evaluatedOn: string, scores: Record<string, number>, possible: number): Evaluation => ({
  id, evaluatedOn, evaluator: 'T. Brackley', notes: null, scores, total: Object.values(scores).reduce((a, b) => a + b, 0), possible,
});

describe('scoringSheet', () => {
  it('lays out the template’s traits against each evaluation, oldest first', () => {
    const later = evaluation(2, '2026-10-01', { body_type: 28, fur: 17.5 }, 55);
    const earlier = evaluation(1, '2026-08-01', { body_type: 24 }, 35);
    const sheet = scoringSheet(DEFAULT_EVALUATION_TRAITS, [later, earlier]);
    // Keeperline's default template (shared/domain/breed.ts) sums to 100 points.
    expect(sheet.templatePoints).toBe(100);
    expect(sheet.evaluations.map((e) => e.evaluatedOn)).toEqual(['2026-08-01', '2026-10-01']);
    expect(sheet.rows[0]).toEqual({ key: 'body_type', label: 'Body type', points: 35, scores: [24, 28] });
    expect(sheet.rows.find((r) => r.key === 'fur')?.scores).toEqual([null, 17.5]);
    expect(sheet.totals).toEqual([{ total: 24, possible: 35 }, { total: 45.5, possible: 55 }]);
  });

  it('keeps scores of a trait the template has since dropped, marked as such', () => {
    const sheet = scoringSheet([{ key: 'fur', label: 'Fur', points: 20 }], [evaluation(1, '2026-08-01', { fur: 15, colour: 8 }, 20)]);
    expect(sheet.rows.map((r) => [r.label, r.points, r.scores[0]])).toEqual([
      ['Fur', 20, 15],
      ['colour (no longer in the template)', null, 8],
    ]);
  });

  it('writes half points plainly and a missing score as a dash', () => {
    expect(scoreText(7.5)).toBe('7.5');
    expect(scoreText(30)).toBe('30');
    expect(scoreText(null)).toBe('–');
  });
});

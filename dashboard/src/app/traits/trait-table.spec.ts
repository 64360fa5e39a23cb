import { toCsv } from '@shared/csv/to-csv';
import { heritabilityReport } from './trait-fixtures';
import { estimateCsvColumns, intervalText, sampleText, withinRange } from './trait-table';

describe('trait inheritance table', () => {
  const report = heritabilityReport();
  const [sire, mid, halfSib] = [report.estimates.sireOffspring!, report.estimates.midparentOffspring!, report.estimates.halfSib!];

  it('says what each sample counts', () => {
    expect(sampleText(sire)).toBe('8 sires');
    expect(sampleText(mid)).toBe('22 matings');
    expect(sampleText(halfSib)).toBe('11 sires, 109 offspring');
    // 0.23 ± 1.96 × 0.25
    expect(intervalText(mid)).toBe('-0.26 to 0.72');
  });

  it('checks an estimate against the published range', () => {
    expect(withinRange(mid, report)).toBe(true);
    expect(withinRange(halfSib, { ...report, plausibleRange: { lower: 0.1, upper: 0.3, source: '' } })).toBe(false);
    expect(withinRange(mid, { ...report, plausibleRange: null })).toBeNull();
  });

  it('exports every method with its standard error, interval and the one used for the reading', () => {
    const csv = toCsv([mid], estimateCsvColumns(report));
    expect(csv.split('\r\n')[1]).toBe('Weight at 12 weeks,Brackenrow only.,Midparent–offspring regression,0.23,0.25,-0.26,0.72,22,22 matings,0.115,0.125,yes,0.1–0.45,');
  });
});

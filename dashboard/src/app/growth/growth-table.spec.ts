import { toCsv } from '@shared/csv/to-csv';
import { sortRows } from '../panels/sort-rows';
import { growthAnimal, growthReport, reference } from './growth-fixtures';
import { WEIGHING_SORT, ageText, bandCsvColumns, projectionText, weighingCsvColumns, weighingRows } from './growth-table';
import { referenceFor, withAnimal, withoutAnimal } from './growth-view';

describe('growth tables and choices', () => {
  it('lists every weighing of the chosen animals and sorts them by centile, missing last', () => {
    const rows = weighingRows([growthAnimal(1, 'BF177'), growthAnimal(2, 'BF179', { weighings: [{ weighedOn: '2026-09-12', ageDays: 56, grams: 700, z: -1, percentile: 12 }] })]);
    expect(rows).toHaveLength(4);
    expect(sortRows(rows, { active: 'percentile', direction: 'asc' }, WEIGHING_SORT).map((r) => `${r.earId}:${r.percentile}`)).toEqual(['BF179:12', 'BF177:48.6', 'BF177:62.2', 'BF177:null']);
  });

  it('says ages in weeks and days, and projections with their interval', () => {
    expect([3, 7, 8, 84, 86].map(ageText)).toEqual(['3 days', '1 week', '1 week 1 day', '12 weeks', '12 weeks 2 days']);
    // 1900 g = 4 lb 3 oz, 1800 g = 3 lb 15 oz, 2000 g = 4 lb 7 oz (1 oz = 28.349523125 g)
    expect(projectionText(growthAnimal(1, 'BF177'), 'lb-oz')).toBe('4 lb 3 oz (3 lb 15 oz – 4 lb 7 oz) at 8 months');
    expect(projectionText(growthAnimal(1, 'BF177', { projection: null }), 'kg')).toBe('—');
  });

  it('exports weighings with grams and the user’s unit, and the bands in grams', () => {
    const [, first] = toCsv(weighingRows([growthAnimal(1, 'BF177')]), weighingCsvColumns('kg')).split('\r\n');
    expect(first).toBe('BF177,2026-09-12,56,800,0.80 kg,48.6');
    const bands = toCsv(reference().bands, bandCsvColumns(reference())).split('\r\n');
    expect(bands[0]).toBe('Breed,Sex,From (days),To (days),Weights,Method,3rd centile (grams),10th centile (grams),25th centile (grams),50th centile (grams),75th centile (grams),90th centile (grams),97th centile (grams)');
    expect(bands[2]).toBe('Mini Rex,doe,63,70,0,no weights,,,,,,,');
  });

  it('adds and removes chosen animals without repeats, up to the API’s 50', () => {
    const view = { scope: 'all' as const };
    expect(withAnimal(withAnimal(view, 5), 5).animals).toEqual([5]);
    expect(withoutAnimal({ ...view, animals: [5] }, 5).animals).toBeUndefined();
    const full = { ...view, animals: Array.from({ length: 50 }, (_, i) => i + 1) };
    expect(withAnimal(full, 99)).toBe(full);
  });

  it('draws the bands of the breed and sex asked for, else of the sex, else the first', () => {
    const report = growthReport({ references: [reference('buck', 1), reference('doe', 1), reference('doe', 2)] });
    expect(referenceFor(report, { scope: 'all', breed: 2, sex: 'doe' })).toBe(report.references[2]);
    expect(referenceFor(report, { scope: 'all', breed: 3, sex: 'doe' })).toBe(report.references[1]);
    expect(referenceFor(report, { scope: 'all' })).toBe(report.references[0]);
    expect(referenceFor(growthReport({ references: [] }), { scope: 'all' })).toBeNull();
  });
});

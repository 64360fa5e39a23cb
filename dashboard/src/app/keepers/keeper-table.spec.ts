import { toCsv } from '@shared/csv/to-csv';
import { candidate, keepersReport } from './keeper-fixtures';
import { sortRows } from '../panels/sort-rows';
import { KEEPER_SORT, componentValue, keeperCsvColumns, projectedText } from './keeper-table';

describe('keeper table', () => {
  it('shows each raw value with its unit', () => {
    expect(componentValue('breedingValue', -0.335)).toBe('−0.34 SD');
    expect(componentValue('ownEvaluation', 80.5)).toBe('81 % of points');
    expect(componentValue('weightOnTarget', -7.02)).toBe('7.0 % off ideal');
    expect(componentValue('parentsPlacementIndex', 1.2119)).toBe('index 1.21');
    // F = 0.205078125 (a Wright coefficient as in the demo) → 20.5 %
    expect(componentValue('inbreeding', 0.205078125)).toBe('F 20.5 %');
    expect(componentValue('ownEvaluation', null)).toBe('—');
  });

  it('shows the projected senior weight with its interval in lb-oz', () => {
    // 1792 g = 3 lb 15 oz, 1594 g = 3 lb 8 oz, 1871 g = 4 lb 2 oz (1 oz = 28.349523125 g, NIST Handbook 44)
    expect(projectedText(candidate({ id: 1, earId: 'A', rank: 1, z: [0, 0, 0, 0, 0] }), 'lb-oz')).toBe('3 lb 15 oz (3 lb 8 oz – 4 lb 2 oz)');
  });

  it('sorts by a component’s contribution and back to rank order when cleared', () => {
    const a = candidate({ id: 1, earId: 'BF10', rank: 1, z: [1, 0, 0, 0, 0] });
    const b = candidate({ id: 2, earId: 'BF9', rank: 2, z: [0, 0, 2, 0, 0] });
    expect(sortRows([a, b], { active: 'weightOnTarget', direction: 'desc' }, KEEPER_SORT).map((c) => c.animal.earId)).toEqual(['BF9', 'BF10']);
    expect(sortRows([a, b], { active: 'earId', direction: 'asc' }, KEEPER_SORT).map((c) => c.animal.earId)).toEqual(['BF9', 'BF10']);
    expect(sortRows([a, b], { active: 'weightOnTarget', direction: '' }, KEEPER_SORT).map((c) => c.rank)).toEqual([1, 2]);
  });

  it('exports every component’s value, weight and contribution, the decision and the explanation, formula-safe', () => {
    const a = candidate({ id: 1, earId: '=BF1', rank: 1, z: [1, 0, 0, 0, 0], explanation: ['Ranked 1st of 1: strong breeding value for weight at 12 weeks.', 'A risk.'] });
    const csv = toCsv([a], keeperCsvColumns('lb-oz', () => 'keep'));
    const [header, row] = csv.split('\r\n');
    expect(header).toContain('Breeding value contribution');
    expect(header!.split(',')).toHaveLength(8 + 15 + 5);
    expect(row).toMatch(/^1,"'=BF1",/);
    expect(row).toContain(',Keep,');
    expect(row).toContain('Ranked 1st of 1: strong breeding value for weight at 12 weeks. A risk.');
  });
});

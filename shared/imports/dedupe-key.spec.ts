import { describe, expect, it } from 'vitest';
import { dedupeKey, dedupeKeyer } from './dedupe-key';
import type { ImportContext } from './import-records';
import { validateRow } from './validate-row';

const ctx: ImportContext = { dateOrder: 'mdy', unitSetting: 'lb-oz', today: '2026-12-01' };

describe('dedupeKey', () => {
  it('the same weighing written two ways has one key', () => {
    const a = validateRow('weights', { ear_id: 'br12', weighed_on: '2026-03-04', weight: '5 lb 12 oz' }, ctx).value!;
    const b = validateRow('weights', { ear_id: ' BR12', weighed_on: '3/4/2026', weight_g: '2608' }, ctx).value!;
    expect(dedupeKey('weights', a)).toBe('br12|2026-03-04');
    expect(dedupeKey('weights', b)).toBe(dedupeKey('weights', a));
  });

  it('animals by ear ID, litters by code, evaluations by ear ID and date', () => {
    expect(dedupeKey('animals', validateRow('animals', { ear_id: 'A1', sex: 'b', breed: 'X' }, ctx).value!)).toBe('a1');
    expect(dedupeKey('litters', validateRow('litters', { litter_code: 'L-26 01', sire_ear_id: 'A1', dam_ear_id: 'A2' }, ctx).value!)).toBe('l-26 01');
    expect(dedupeKey('evaluations', validateRow('evaluations', { ear_id: 'A1', evaluated_on: '2026-06-01', fur: '10' }, ctx).value!)).toBe('a1|2026-06-01');
  });

  it('results use the ear ID, or the exhibitor when the animal has none', () => {
    const row = {
      show_name: 'Test  Show', show_date: '2026-04-11', judge: 'J', exhibitor: 'Outside Herd', breed: 'Test Compact', variety: 'Black',
      sex: 'doe', age_class: 'junior', entries_in_class: '6', exhibitors_in_class: '3', placing: '2',
    };
    expect(dedupeKey('results', validateRow('results', row, ctx).value!)).toBe(
      'test show|2026-04-11|test compact|black|doe|junior|2|exhibitor:outside herd',
    );
    expect(dedupeKey('results', validateRow('results', { ...row, ear_id: 'q7' }, ctx).value!)).toBe(
      'test show|2026-04-11|test compact|black|doe|junior|2|ear:q7',
    );
  });

  it('one file\'s key function gives each record its own key, whatever came before', () => {
    const base = {
      show_name: 'Test Show', show_date: '2026-04-11', judge: 'J', exhibitor: 'Outside Herd', breed: 'Test Compact', variety: 'Black',
      sex: 'doe', age_class: 'junior', entries_in_class: '6', exhibitors_in_class: '3', placing: '2',
    };
    const rows = [base, { ...base, variety: 'Blue ', ear_id: 'q7' }, base, { ...base, show_name: 'TEST  SHOW', placing: '3' }, base];
    const keyOf = dedupeKeyer('results');
    const records = rows.map((r) => validateRow('results', r, ctx).value!);
    expect(records.map(keyOf)).toEqual(records.map((v) => dedupeKey('results', v)));
    expect(new Set(records.map(keyOf)).size).toBe(3);
  });
});

import { describe, expect, it } from 'vitest';
import { HerdQuery } from '@shared/contracts/animals';
import { containsPattern, herdSql } from './herd-query';

const q = (input: Record<string, unknown>) => HerdQuery.parse(input);

describe('herdSql', () => {
  it('pages with LIMIT/OFFSET and sorts by the mapped column, ties by id', () => {
    const { rows } = herdSql(3, q({ page: '3', pageSize: '25', sort: 'latestWeight', dir: 'desc' }), '2026-05-01');
    expect(rows.sql).toMatch(/ORDER BY lw\.grams DESC, a\.id DESC LIMIT \? OFFSET \?$/);
    expect(rows.params.slice(-2)).toEqual([25, 50]);
  });

  it('carries every filter value as a parameter and leaves stubs out by default', () => {
    const { rows, count } = herdSql(3, q({ sex: 'doe', breedId: '2', variety: 'Blue', status: 'active', line: 'A' }), '2026-05-01');
    expect(count.sql).toContain('a.is_stub = 0');
    expect(count.params).toEqual([3, 'doe', 2, 'Blue', 'active', 'A']);
    expect(rows.params).toEqual([3, 'doe', 2, 'Blue', 'active', 'A', 50, 0]);
  });

  it('unpaged (CSV) has no LIMIT', () => {
    const { rows } = herdSql(3, q({}), '2026-05-01', false);
    expect(rows.sql).not.toContain('LIMIT');
    expect(rows.params).toEqual([3]);
  });

  it('refuses sort keys and page sizes outside the contract', () => {
    expect(() => q({ sort: 'a.id; DROP TABLE animal' })).toThrow();
    expect(() => q({ pageSize: '201' })).toThrow(/At most 200/);
  });

  it('searches ear ID and name with LIKE wildcards taken literally', () => {
    expect(containsPattern('5%_a\\')).toBe('%5\\%\\_a\\\\%');
    const { count } = herdSql(1, q({ q: 'FH' }), '2026-05-01');
    expect(count.sql).toContain('(a.ear_id LIKE ? OR a.name LIKE ?)');
    expect(count.params).toEqual([1, '%FH%', '%FH%']);
  });

  it('builds the age-class condition from the domain thresholds (6 and 8 months)', () => {
    expect(herdSql(1, q({ ageClass: 'junior' }), '2026-05-01').count.sql).toContain('INTERVAL 6 MONTH');
    expect(herdSql(1, q({ ageClass: 'senior' }), '2026-05-01').count.sql).toContain("INTERVAL IF(b.class_scheme = 'six-class', 8, 6) MONTH");
  });
});

import type { HerdQuery } from '@shared/contracts/animals';
import { INTERMEDIATE_UNTIL_MONTHS, JUNIOR_UNTIL_MONTHS } from '@shared/domain/age-class';
import { LATEST_WEIGHT_JOIN } from '../weights/latest-weight-join';

export interface HerdSql { rows: { sql: string; params: unknown[] }; count: { sql: string; params: unknown[] } }

/** Sort keys of the herd table → SQL; only these ever reach ORDER BY. */
const SORT_COLUMNS: Record<HerdQuery['sort'], string> = {
  earId: 'a.ear_id', name: 'a.name', sex: 'a.sex', breed: 'b.name', variety: 'a.variety',
  birthDate: 'a.birth_date', line: 'a.line', status: 'a.status', latestWeight: 'lw.grams',
};

/** LIKE pattern matching `text` anywhere, with LIKE's own wildcards taken literally. */
export function containsPattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/**
 * Age class on `today` in SQL, the same rule as ageClassOn (shared/domain/age-class): junior
 * while today < birth + 6 months; six-class breeds intermediate until birth + 8 months; else
 * senior. MariaDB's DATE_ADD(…, INTERVAL n MONTH) clamps to the month's last day as addMonths
 * does (Aug 31 + 6 months = Feb 28/29). Animals without a breed use the four-class scheme.
 */
function ageClassCondition(ageClass: NonNullable<HerdQuery['ageClass']>, today: string): { sql: string; params: unknown[] } {
  const born = 'a.birth_date IS NOT NULL AND a.birth_date <= CAST(? AS DATE)';
  const upTo = (months: string) => `DATE_ADD(a.birth_date, INTERVAL ${months} MONTH)`;
  const sixClass = "b.class_scheme = 'six-class'";
  switch (ageClass) {
    case 'junior':
      return { sql: `${born} AND CAST(? AS DATE) < ${upTo(String(JUNIOR_UNTIL_MONTHS))}`, params: [today, today] };
    case 'intermediate':
      return {
        sql: `${born} AND ${sixClass} AND CAST(? AS DATE) >= ${upTo(String(JUNIOR_UNTIL_MONTHS))} AND CAST(? AS DATE) < ${upTo(String(INTERMEDIATE_UNTIL_MONTHS))}`,
        params: [today, today, today],
      };
    case 'senior':
      return {
        sql: `${born} AND CAST(? AS DATE) >= ${upTo(`IF(${sixClass}, ${INTERMEDIATE_UNTIL_MONTHS}, ${JUNIOR_UNTIL_MONTHS})`)}`,
        params: [today, today],
      };
  }
}

/**
 * The herd table's queries: one for the rows (breed and latest weight joined, sorted, paged)
 * and one for the count, sharing the filters. `paged: false` returns every matching row (CSV).
 * Values only ever travel as parameters; sort keys map through a fixed table.
 * Cost of building: O(number of filters).
 */
export function herdSql(rabbitryId: number, q: HerdQuery, today: string, paged = true): HerdSql {
  const where = ['a.rabbitry_id = ?'];
  const params: unknown[] = [rabbitryId];
  const add = (sql: string, ...values: unknown[]) => { where.push(sql); params.push(...values); };
  if (q.stubs === 'exclude') add('a.is_stub = 0');
  if (q.stubs === 'only') add('a.is_stub = 1');
  if (q.q) add('(a.ear_id LIKE ? OR a.name LIKE ?)', containsPattern(q.q), containsPattern(q.q));
  if (q.sex) add('a.sex = ?', q.sex);
  if (q.breedId) add('a.breed_id = ?', q.breedId);
  if (q.variety) add('a.variety = ?', q.variety);
  if (q.status) add('a.status = ?', q.status);
  if (q.line) add('a.line = ?', q.line);
  if (q.ageClass) {
    const c = ageClassCondition(q.ageClass, today);
    add(c.sql, ...c.params);
  }
  const filter = where.join(' AND ');
  const dir = q.dir === 'desc' ? 'DESC' : 'ASC';
  const page = paged ? ' LIMIT ? OFFSET ?' : '';
  return {
    rows: {
      sql: `SELECT a.id, a.ear_id, a.name, a.sex, a.breed_id, b.name AS breed, b.class_scheme, a.variety, a.birth_date,
                   a.line, a.status, a.is_stub, a.registration_no, a.grand_champion, a.keeper_decision,
                   lw.grams AS lw_grams, lw.weighed_on AS lw_on
              FROM animal a LEFT JOIN breed b ON b.id = a.breed_id ${LATEST_WEIGHT_JOIN}
             WHERE ${filter}
             ORDER BY ${SORT_COLUMNS[q.sort]} ${dir}, a.id ${dir}${page}`,
      params: paged ? [...params, q.pageSize, (q.page - 1) * q.pageSize] : params,
    },
    count: { sql: `SELECT COUNT(*) AS n FROM animal a LEFT JOIN breed b ON b.id = a.breed_id WHERE ${filter}`, params },
  };
}

import type { ShowDetail, ShowResult } from '@shared/contracts/shows';

/**
 * What a show's results hold: classes (breed × variety × sex × age class), breeds, exhibitors,
 * matched results, age-class mismatches, and per judge the classes and results judged. A result
 * without a judge of its own counts for the show's judges together. O(r log r) for r results.
 */
export function showCounts(results: readonly ShowResult[], showJudges: readonly string[]): Pick<ShowDetail, 'counts' | 'judging'> {
  const classOf = (r: ShowResult) => [r.breed, r.variety ?? '', r.sex, r.ageClass].join('\u0000').toLowerCase();
  const fallback = showJudges.length ? showJudges.join(', ') : null;
  const judges = new Map<string | null, { classes: Set<string>; results: number }>();
  for (const r of results) {
    const judge = r.judge ?? fallback;
    let j = judges.get(judge);
    if (!j) judges.set(judge, (j = { classes: new Set(), results: 0 }));
    j.classes.add(classOf(r));
    j.results++;
  }
  const distinct = (key: (r: ShowResult) => string) => new Set(results.map((r) => key(r).toLowerCase())).size;
  return {
    counts: {
      classes: distinct(classOf),
      breeds: distinct((r) => r.breed),
      exhibitors: distinct((r) => r.exhibitor),
      matched: results.filter((r) => r.matched).length,
      ageClassMismatches: results.filter((r) => r.ageClassMismatch).length,
    },
    judging: [...judges]
      .map(([judge, j]) => ({ judge, classes: j.classes.size, results: j.results }))
      .sort((a, b) => b.results - a.results || (a.judge ?? '\uffff').localeCompare(b.judge ?? '\uffff')),
  };
}

import type { DataSource } from 'typeorm';
import type { ClassResultLine } from '@shared/domain/competition-sizes';
import { type AnimalFacts, type AnimalShowRecord, buildShowRecords, type StoredResult } from './build-show-records';
import { parseAwards } from './parse-awards';

const jsonList = (v: unknown): string[] => (Array.isArray(v) ? v : typeof v === 'string' ? JSON.parse(v) : []);

/**
 * The show records of a set of animals in two queries whatever their number: their results
 * with the shows, then one line per class of those shows (for the competition sizes legs need).
 */
export async function loadShowRecords(db: DataSource, animals: readonly AnimalFacts[]): Promise<Map<number, AnimalShowRecord>> {
  if (animals.length === 0) return new Map();
  const rows: Record<string, unknown>[] = await db.query(
    `SELECT sr.id, sr.animal_id, sr.show_id, s.name AS show_name, s.show_date, s.judges, sr.judge, sr.ear_id, sr.breed,
            sr.variety, sr.sex, sr.age_class, sr.entries_in_class, sr.exhibitors_in_class, sr.placing, sr.awards
       FROM show_result sr JOIN \`show\` s ON s.id = sr.show_id
      WHERE sr.animal_id IN (?)`, [animals.map((a) => a.id)]);
  const results: StoredResult[] = rows.map((r) => ({
    id: r.id as number, animalId: r.animal_id as number, showId: r.show_id as number, showName: r.show_name as string,
    showDate: r.show_date as string, judge: r.judge as string | null, showJudges: jsonList(r.judges), earId: r.ear_id as string | null,
    breed: r.breed as string, variety: r.variety as string | null, sex: r.sex as StoredResult['sex'], ageClass: r.age_class as StoredResult['ageClass'],
    entriesInClass: r.entries_in_class as number, exhibitorsInClass: r.exhibitors_in_class as number, placing: r.placing as number,
    awards: parseAwards(r.awards as string),
  }));
  const showIds = [...new Set(results.map((r) => r.showId))];
  const classes: (ClassResultLine & { showId: number })[] = [];
  if (showIds.length) {
    const lines: Record<string, unknown>[] = await db.query(
      `SELECT show_id, breed, variety, sex, age_class, MAX(entries_in_class) AS e, MAX(exhibitors_in_class) AS x
         FROM show_result WHERE show_id IN (?) GROUP BY show_id, breed, variety, sex, age_class`, [showIds]);
    for (const l of lines) {
      classes.push({
        showId: l.show_id as number, breed: l.breed as string, variety: l.variety as string | null, sex: l.sex as 'buck' | 'doe',
        ageClass: l.age_class as ClassResultLine['ageClass'], entriesInClass: Number(l.e), exhibitorsInClass: Number(l.x),
      });
    }
  }
  return buildShowRecords(results, classes, animals);
}

import type { Pool } from 'mysql2';
import type { DataSource } from 'typeorm';
import type { PointsFormula } from '@shared/contracts/analytics';
import type { ClassWeightLimits, EvaluationTrait } from '@shared/domain/breed';
import type { AgeClass, ClassScheme, Sex } from '@shared/domain/terms';
import type { AnimalStatus } from '../db/entities/animal.entity';
import { notFound } from '../http/app-error';
import { loadShowRecords } from '../shows/load-show-records';
import type { AnimalShowRecord } from '../shows/build-show-records';

/**
 * The only file of the analytics feature that talks to the database. Large reads go through
 * mysql2's `rowsAsArray` (a third of the cost of row objects at 500,000 rows) and come back as
 * plain arrays; JSON columns (LONGTEXT in MariaDB) are parsed here.
 */

export interface AnimalRow {
  id: number; rabbitryId: number; earId: string; name: string | null; sex: Sex; breedId: number | null;
  variety: string | null; birthDate: string | null; sireId: number | null; damId: number | null; litterId: number | null;
  line: string | null; status: AnimalStatus; isStub: boolean; grandChampion: boolean; keeperDecision: 'keep' | 'sell' | 'undecided' | null;
}
export interface WeightRow { animalId: number; weighedOn: string; grams: number }
export interface EvaluationRow { animalId: number; evaluatedOn: string; scores: Record<string, number> }
export interface LitterRow { id: number; rabbitryId: number; sireId: number | null; damId: number | null; kindledOn: string | null; bornAlive: number | null; weaned: number | null }
/** A show result of an animal of the scope (light: what placement scores and groupings need). */
export interface HerdResultRow { id: number; animalId: number; showId: number; showDate: string; placing: number; entries: number }
export interface BreedRow { id: number; name: string; classScheme: ClassScheme; weightLimits: Record<Sex, ClassWeightLimits> | null; traits: EvaluationTrait[] }

export interface HerdRows {
  rabbitries: { id: number; name: string }[];
  animals: AnimalRow[];
  weights: WeightRow[];
  evaluations: EvaluationRow[];
  litters: LitterRow[];
  results: HerdResultRow[];
  breeds: BreedRow[];
}

export interface ClubResultRow {
  id: number; showId: number; animalId: number | null; earId: string | null; exhibitor: string; breed: string; variety: string | null;
  sex: Sex; ageClass: AgeClass; entries: number; exhibitors: number; placing: number; awards: string; judge: string | null;
}
export interface ClubRows {
  club: { id: number; name: string; seasonStart: string | null; seasonEnd: string | null; pointsFormula: unknown; legRule: unknown };
  shows: { id: number; name: string; date: string; judges: string[] }[];
  results: ClubResultRow[];
  /** Members' exhibitor names and herds (for "member" flags and the top sires). */
  members: { exhibitorName: string | null; rabbitryId: number | null }[];
  /** The sires of members' animals that have results: animal id → sire facts. */
  sires: { animalId: number; sireId: number; sireEarId: string; sireName: string | null; rabbitryId: number }[];
}

const json = <T>(v: unknown, fallback: T): T => {
  if (v === null || v === undefined) return fallback;
  if (typeof v === 'string') {
    try { return JSON.parse(v) as T; } catch { return fallback; }
  }
  return v as T;
};

export class AnalyticsRepository {
  constructor(private readonly db: DataSource) {}

  private get pool(): Pool {
    return (this.db.driver as unknown as { pool: Pool }).pool;
  }

  /** Rows as arrays, straight from mysql2 (no entity mapping). */
  private rows(sql: string, values: unknown[]): Promise<unknown[][]> {
    return new Promise((resolve, reject) => {
      this.pool.query({ sql, values, rowsAsArray: true }, (err, rows) => (err ? reject(err) : resolve(rows as unknown[][])));
    });
  }

  /** The rabbitries a user may see: the ones they hold a role in; every one for an admin. */
  async visibleRabbitries(userId: number, isAdmin: boolean): Promise<{ id: number; name: string }[]> {
    const rows = isAdmin
      ? await this.rows('SELECT id, name FROM rabbitry ORDER BY id', [])
      : await this.rows('SELECT r.id, r.name FROM rabbitry r JOIN rabbitry_membership m ON m.rabbitry_id = r.id WHERE m.user_id = ? GROUP BY r.id, r.name ORDER BY r.id', [userId]);
    return rows.map(([id, name]) => ({ id: Number(id), name: String(name) }));
  }

  /**
   * A cheap fingerprint of everything the herd analytics read for these rabbitries. Tables that
   * only grow or shrink through the API (weights, evaluations, show results) are read from their
   * indexes alone: row count and highest id. Animals carry updated_at; litters, shows, breeds
   * and rabbitries are small and edited in place, so they get a sum of per-row CRC32 checksums.
   * Finished imports are counted too (an import may re-match results to animals). Any change
   * through Keeperline changes it; a hand-made SQL UPDATE of a weight's grams would not.
   */
  async herdStamp(rabbitryIds: readonly number[]): Promise<string> {
    if (rabbitryIds.length === 0) return 'empty';
    const ids = [rabbitryIds];
    const [row] = await this.rows(`SELECT
      (SELECT CONCAT_WS('/', COUNT(*), IFNULL(MAX(id), 0), IFNULL(MAX(updated_at), '')) FROM animal WHERE rabbitry_id IN (?)),
      (SELECT CONCAT_WS('/', COUNT(*), IFNULL(MAX(w.id), 0)) FROM weight_record w JOIN animal a ON a.id = w.animal_id WHERE a.rabbitry_id IN (?)),
      (SELECT CONCAT_WS('/', COUNT(*), IFNULL(MAX(e.id), 0)) FROM evaluation e JOIN animal a ON a.id = e.animal_id WHERE a.rabbitry_id IN (?)),
      (SELECT CONCAT_WS('/', COUNT(*), IFNULL(SUM(CRC32(CONCAT_WS('|', id, IFNULL(sire_id, ''), IFNULL(dam_id, ''), IFNULL(kindled_on, ''),
          IFNULL(born_alive, ''), IFNULL(weaned, '')))), 0))
         FROM litter WHERE rabbitry_id IN (?)),
      (SELECT CONCAT_WS('/', COUNT(*), IFNULL(MAX(r.id), 0)) FROM show_result r JOIN animal a ON a.id = r.animal_id WHERE a.rabbitry_id IN (?)),
      (SELECT CONCAT_WS('/', COUNT(*), IFNULL(SUM(CRC32(CONCAT_WS('|', id, show_date, judges))), 0)) FROM \`show\`),
      (SELECT CONCAT_WS('/', COUNT(*), IFNULL(SUM(CRC32(CONCAT_WS('|', id, name, class_scheme, weight_limits, evaluation_template))), 0)) FROM breed),
      (SELECT CONCAT_WS('/', COUNT(*), IFNULL(MAX(id), 0)) FROM import_job WHERE status = 'done'),
      (SELECT IFNULL(SUM(CRC32(CONCAT_WS('|', id, name))), 0) FROM rabbitry WHERE id IN (?))`, [...ids, ...ids, ...ids, ...ids, ...ids, ...ids]);
    return row!.join(';');
  }

  /** Everything the herd analytics read for these rabbitries, in seven queries whatever their size. */
  async loadHerd(rabbitryIds: readonly number[]): Promise<HerdRows> {
    const breeds = await this.loadBreeds();
    if (rabbitryIds.length === 0) return { rabbitries: [], animals: [], weights: [], evaluations: [], litters: [], results: [], breeds };
    const ids = [rabbitryIds];
    const [rabbitries, animals, weights, evaluations, litters, results] = await Promise.all([
      this.rows('SELECT id, name FROM rabbitry WHERE id IN (?) ORDER BY id', ids),
      this.rows(`SELECT id, rabbitry_id, ear_id, name, sex, breed_id, variety, birth_date, sire_id, dam_id, litter_id, line, status,
                        is_stub, grand_champion, keeper_decision FROM animal WHERE rabbitry_id IN (?) ORDER BY id`, ids),
      this.rows(`SELECT w.animal_id, w.weighed_on, w.grams FROM weight_record w JOIN animal a ON a.id = w.animal_id
                  WHERE a.rabbitry_id IN (?) ORDER BY w.animal_id, w.weighed_on`, ids),
      this.rows(`SELECT e.animal_id, e.evaluated_on, e.scores FROM evaluation e JOIN animal a ON a.id = e.animal_id
                  WHERE a.rabbitry_id IN (?) ORDER BY e.animal_id, e.evaluated_on`, ids),
      this.rows('SELECT id, rabbitry_id, sire_id, dam_id, kindled_on, born_alive, weaned FROM litter WHERE rabbitry_id IN (?) ORDER BY id', ids),
      this.rows(`SELECT r.id, r.animal_id, r.show_id, s.show_date, r.placing, r.entries_in_class FROM show_result r
                   JOIN animal a ON a.id = r.animal_id JOIN \`show\` s ON s.id = r.show_id
                  WHERE a.rabbitry_id IN (?) ORDER BY r.id`, ids),
    ]);
    return {
      rabbitries: rabbitries.map(([id, name]) => ({ id: Number(id), name: String(name) })),
      animals: animals.map((r) => ({
        id: Number(r[0]), rabbitryId: Number(r[1]), earId: String(r[2]), name: (r[3] as string | null) ?? null, sex: r[4] as Sex,
        breedId: r[5] === null ? null : Number(r[5]), variety: (r[6] as string | null) ?? null, birthDate: (r[7] as string | null) ?? null,
        sireId: r[8] === null ? null : Number(r[8]), damId: r[9] === null ? null : Number(r[9]), litterId: r[10] === null ? null : Number(r[10]),
        line: (r[11] as string | null) ?? null, status: r[12] as AnimalStatus, isStub: Boolean(r[13]), grandChampion: Boolean(r[14]),
        keeperDecision: (r[15] as AnimalRow['keeperDecision']) ?? null,
      })),
      weights: weights.map((r) => ({ animalId: Number(r[0]), weighedOn: String(r[1]), grams: Number(r[2]) })),
      evaluations: evaluations.map((r) => ({ animalId: Number(r[0]), evaluatedOn: String(r[1]), scores: json<Record<string, number>>(r[2], {}) })),
      litters: litters.map((r) => ({
        id: Number(r[0]), rabbitryId: Number(r[1]), sireId: r[2] === null ? null : Number(r[2]), damId: r[3] === null ? null : Number(r[3]),
        kindledOn: (r[4] as string | null) ?? null, bornAlive: r[5] === null ? null : Number(r[5]), weaned: r[6] === null ? null : Number(r[6]),
      })),
      results: results.map((r) => ({
        id: Number(r[0]), animalId: Number(r[1]), showId: Number(r[2]), showDate: String(r[3]), placing: Number(r[4]), entries: Number(r[5]),
      })),
      breeds,
    };
  }

  private async loadBreeds(): Promise<BreedRow[]> {
    const rows = await this.rows('SELECT id, name, class_scheme, weight_limits, evaluation_template FROM breed ORDER BY id', []);
    return rows.map((r) => ({
      id: Number(r[0]), name: String(r[1]), classScheme: r[2] as ClassScheme,
      weightLimits: json<Record<Sex, ClassWeightLimits> | null>(r[3], null),
      traits: json<{ traits?: EvaluationTrait[] }>(r[4], {}).traits ?? [],
    }));
  }

  /** Show records with legs and grand champion status (shows/load-show-records) of some animals. */
  showRecords(animals: { id: number; birthDate: string | null; classScheme: ClassScheme | null }[]): Promise<Map<number, AnimalShowRecord>> {
    return loadShowRecords(this.db, animals);
  }

  /**
   * Fingerprint of a club's season data, in the manner of herdStamp: the club's settings, its
   * shows (checksums), its results (count and highest id, from the index), finished imports,
   * its members, and the members' animals (their sires feed the top sires).
   */
  async clubStamp(clubId: number): Promise<string> {
    const [row] = await this.rows(`SELECT
      (SELECT CONCAT_WS('|', name, IFNULL(season_start, ''), IFNULL(season_end, ''), IFNULL(points_formula, ''), IFNULL(leg_rule, '')) FROM club WHERE id = ?),
      (SELECT CONCAT_WS('/', COUNT(*), IFNULL(SUM(CRC32(CONCAT_WS('|', id, name, show_date, judges))), 0)) FROM \`show\` WHERE club_id = ?),
      (SELECT CONCAT_WS('/', COUNT(*), IFNULL(MAX(r.id), 0)) FROM show_result r JOIN \`show\` s ON s.id = r.show_id WHERE s.club_id = ?),
      (SELECT CONCAT_WS('/', COUNT(*), IFNULL(MAX(id), 0)) FROM import_job WHERE status = 'done'),
      (SELECT IFNULL(SUM(CRC32(CONCAT_WS('|', id, user_id, role, IFNULL(exhibitor_name, ''), IFNULL(rabbitry_id, '')))), 0) FROM club_membership WHERE club_id = ?),
      (SELECT CONCAT_WS('/', COUNT(*), IFNULL(MAX(a.id), 0), IFNULL(MAX(a.updated_at), ''))
         FROM animal a WHERE a.rabbitry_id IN (SELECT rabbitry_id FROM club_membership WHERE club_id = ? AND rabbitry_id IS NOT NULL))`,
    [clubId, clubId, clubId, clubId, clubId]);
    return row!.join(';');
  }

  async loadClub(clubId: number): Promise<ClubRows> {
    const [clubRow] = await this.rows('SELECT id, name, season_start, season_end, points_formula, leg_rule FROM club WHERE id = ?', [clubId]);
    if (!clubRow) throw notFound('Club');
    const [shows, members] = await Promise.all([
      this.rows('SELECT id, name, show_date, judges FROM `show` WHERE club_id = ? ORDER BY show_date, id', [clubId]),
      this.rows('SELECT exhibitor_name, rabbitry_id FROM club_membership WHERE club_id = ?', [clubId]),
    ]);
    const results: ClubResultRow[] = [];
    const showIds = shows.map((s) => Number(s[0]));
    // In slices of shows, so that a season of a million results never sits in memory twice.
    for (let i = 0; i < showIds.length; i += 20) {
      const rows = await this.rows(`SELECT id, show_id, animal_id, ear_id, exhibitor, breed, variety, sex, age_class, entries_in_class,
                                           exhibitors_in_class, placing, awards, judge
                                      FROM show_result WHERE show_id IN (?)`, [showIds.slice(i, i + 20)]);
      for (const r of rows) {
        results.push({
          id: Number(r[0]), showId: Number(r[1]), animalId: r[2] === null ? null : Number(r[2]), earId: (r[3] as string | null) || null,
          exhibitor: String(r[4]), breed: String(r[5]), variety: (r[6] as string | null) ?? null, sex: r[7] as Sex, ageClass: r[8] as AgeClass,
          entries: Number(r[9]), exhibitors: Number(r[10]), placing: Number(r[11]), awards: String(r[12] ?? ''), judge: (r[13] as string | null) ?? null,
        });
      }
    }
    const memberHerds = members.map((m) => m[1]).filter((v) => v !== null).map(Number);
    const sires = memberHerds.length === 0 ? [] : await this.rows(
      `SELECT a.id, s.id, s.ear_id, s.name, a.rabbitry_id FROM animal a JOIN animal s ON s.id = a.sire_id
        WHERE a.rabbitry_id IN (?) AND a.id IN (SELECT r.animal_id FROM show_result r JOIN \`show\` sh ON sh.id = r.show_id WHERE sh.club_id = ?)`,
      [memberHerds, clubId]);
    return {
      club: {
        id: Number(clubRow[0]), name: String(clubRow[1]), seasonStart: (clubRow[2] as string | null) ?? null, seasonEnd: (clubRow[3] as string | null) ?? null,
        pointsFormula: json<unknown>(clubRow[4], null), legRule: json<unknown>(clubRow[5], null),
      },
      shows: shows.map((s) => ({ id: Number(s[0]), name: String(s[1]), date: String(s[2]), judges: json<string[]>(s[3], []) })),
      results,
      members: members.map((m) => ({ exhibitorName: (m[0] as string | null) ?? null, rabbitryId: m[1] === null ? null : Number(m[1]) })),
      sires: sires.map((r) => ({ animalId: Number(r[0]), sireId: Number(r[1]), sireEarId: String(r[2]), sireName: (r[3] as string | null) ?? null, rabbitryId: Number(r[4]) })),
    };
  }

  async saveSeason(clubId: number, settings: { seasonStart: string; seasonEnd: string; pointsFormula: PointsFormula | null }): Promise<void> {
    const res: { affectedRows: number } = await this.db.query('UPDATE club SET season_start = ?, season_end = ?, points_formula = ? WHERE id = ?',
      [settings.seasonStart, settings.seasonEnd, settings.pointsFormula === null ? null : JSON.stringify(settings.pointsFormula), clubId]);
    if (!res.affectedRows) throw notFound('Club');
  }
}

import { createReadStream, createWriteStream, type WriteStream } from 'node:fs';
import { readFile, stat, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { Transform } from 'node:stream';
import type { DataSource, EntityManager } from 'typeorm';
import type { ImportRecords } from '@shared/imports/import-records';
import { rowValidator } from '@shared/imports/validate-row';
import { ClubMembership } from '../db/entities/club-membership.entity';
import { Show } from '../db/entities/show.entity';
import type { CheckReport, CommitProgress, ImporterContext, KindImporter } from './kind-importer';
import { HashRowSet } from './hash-row-set';
import { TsvLines, tsvField } from './tsv';

type Result = ImportRecords['results'];
interface StagedShow { id: number | null; name: string; showDate: string; location: string | null; sanctionNo: string | null; judges: string[] }

const norm = (s: string) => s.trim().replace(/\s+/g, ' ').toLowerCase();

/**
 * Show results for a club. The check matches each result to a member's animal (exhibitor name
 * → the member's herd, then ear ID), finds results already present, and stages the new rows as
 * a LOAD DATA file; the commit creates the new shows and loads the staged rows in one
 * transaction with MariaDB's own bulk loader (INSERT IGNORE semantics on the dedupe key).
 */
export class ResultsImporter implements KindImporter<'results'> {
  private shows = new Map<string, number>();
  private staged: StagedShow[] = [];
  private existingKeys = new HashRowSet();
  private memberHerds = new Map<string, number>();
  private animalsByHerd = new Map<number, Map<string, number>>();
  private out: WriteStream | null = null;
  private lines: TsvLines | null = null;
  /** The last row's show and exhibitor, as written: most rows repeat them. */
  private lastShow = { name: '', date: '', index: -1 };
  private readonly herdOfExhibitor = new Map<string, number | null>();
  private readonly tsvPath: string;
  private readonly showsPath: string;
  readonly validate = rowValidator('results', { dateOrder: this.ctx.options.dateOrder, unitSetting: this.ctx.unitSetting, today: this.ctx.today }, this.ctx.columns);

  constructor(private readonly db: DataSource, private readonly ctx: ImporterContext) {
    this.tsvPath = join(ctx.stagingDir, `job-${ctx.jobId}.results.tsv`);
    this.showsPath = join(ctx.stagingDir, `job-${ctx.jobId}.shows.json`);
  }

  /** For the check: loads what the file is compared with and opens the staging file. */
  static async forCheck(db: DataSource, ctx: ImporterContext): Promise<ResultsImporter> {
    const imp = new ResultsImporter(db, ctx);
    await imp.load();
    return imp;
  }

  /** For the commit: works from the check's staging files alone. */
  static forCommit(db: DataSource, ctx: ImporterContext): ResultsImporter {
    return new ResultsImporter(db, ctx);
  }

  /** The staging files, removed once the job has ended. */
  get stagingFiles(): string[] {
    return [this.tsvPath, this.showsPath];
  }

  private async load(): Promise<void> {
    const clubId = this.ctx.scopeId;
    const members = await this.db.getRepository(ClubMembership).findBy({ clubId });
    for (const m of members) if (m.exhibitorName && m.rabbitryId) this.memberHerds.set(norm(m.exhibitorName), m.rabbitryId);
    const herdIds = [...new Set(this.memberHerds.values())];
    if (herdIds.length) {
      const animals: { id: number; rabbitry_id: number; ear_id: string }[] = await this.db.query(
        'SELECT id, rabbitry_id, ear_id FROM animal WHERE rabbitry_id IN (?) AND is_stub = 0', [herdIds]);
      for (const a of animals) {
        let herd = this.animalsByHerd.get(a.rabbitry_id);
        if (!herd) this.animalsByHerd.set(a.rabbitry_id, (herd = new Map()));
        herd.set(a.ear_id.toUpperCase(), a.id);
      }
    }
    for (const s of await this.db.getRepository(Show).findBy({ clubId })) {
      this.shows.set(`${norm(s.name)}|${s.showDate}`, this.staged.length);
      this.staged.push({ id: s.id, name: s.name, showDate: s.showDate, location: s.location, sanctionNo: s.sanctionNo, judges: s.judges });
    }
    const existingIds = this.staged.map((s) => s.id);
    // Show by show, from the dedupe index alone: a club's million results on record never
    // arrive as a million objects at once.
    for (const showId of existingIds) {
      const rows: { k: string }[] = await this.db.query('SELECT LOWER(HEX(dedupe_key)) AS k FROM show_result WHERE show_id = ?', [showId]);
      for (const r of rows) this.existingKeys.add(r.k);
    }
    this.out = createWriteStream(this.tsvPath, { highWaterMark: 1 << 20 });
    this.lines = new TsvLines(this.out);
  }

  accept(r: Result, _row: number, keyHash: string, report: CheckReport): void {
    if (this.existingKeys.has(keyHash)) {
      report.alreadyPresent++;
      return;
    }
    const index = this.showIndex(r);
    const show = this.staged[index]!;
    if (show.id === null && !show.judges.includes(r.judge)) show.judges.push(r.judge);
    const herd = this.memberHerd(r.exhibitor);
    const animalId = herd !== null && r.earId ? this.animalsByHerd.get(herd)?.get(r.earId) ?? null : null;
    report.newRows++;
    // ELT() in the commit is 1-based.
    this.lines!.add(`${index + 1}\t${animalId ?? '\\N'}\t${tsvField(r.earId)}\t${tsvField(r.exhibitor)}\t${tsvField(r.breed)}\t${tsvField(r.variety)}\t${r.sex}\t${r.ageClass}\t${r.entriesInClass}\t${r.exhibitorsInClass}\t${r.placing}\t${r.awards.join(' ')}\t${tsvField(r.judge)}\t${keyHash}\n`);
  }

  private showIndex(r: Result): number {
    const last = this.lastShow;
    if (last.name === r.showName && last.date === r.showDate) return last.index;
    const showKey = `${norm(r.showName)}|${r.showDate}`;
    let index = this.shows.get(showKey);
    if (index === undefined) {
      index = this.staged.length;
      this.shows.set(showKey, index);
      this.staged.push({ id: null, name: r.showName, showDate: r.showDate, location: r.location, sanctionNo: r.sanctionNo, judges: [] });
    }
    this.lastShow = { name: r.showName, date: r.showDate, index };
    return index;
  }

  /** The member's herd an exhibitor name belongs to (names as written are few; each is normalised once). */
  private memberHerd(exhibitor: string): number | null {
    let herd = this.herdOfExhibitor.get(exhibitor);
    if (herd === undefined) {
      herd = this.memberHerds.get(norm(exhibitor)) ?? null;
      if (this.herdOfExhibitor.size < 100_000) this.herdOfExhibitor.set(exhibitor, herd);
    }
    return herd;
  }

  async endChunk(): Promise<void> {
    await this.lines!.drained();
  }

  async finishCheck(): Promise<void> {
    await this.endChunk();
    await new Promise<void>((resolve, reject) => this.out!.end((e?: Error | null) => (e ? reject(e) : resolve())));
    await writeFile(this.showsPath, JSON.stringify(this.staged));
  }

  /**
   * Uses the staged files of the check; nothing is parsed again. One LOAD DATA of every staged
   * row; IGNORE skips a row another import added since the check (the unique dedupe key).
   */
  async commit(tx: EntityManager, progress: CommitProgress): Promise<number> {
    const staged: StagedShow[] = JSON.parse(await readFile(this.showsPath, 'utf8'));
    const ids: number[] = [];
    for (const s of staged) {
      if (s.id === null) {
        const saved = await tx.getRepository(Show).save({
          clubId: this.ctx.scopeId, name: s.name, showDate: s.showDate, location: s.location, sanctionNo: s.sanctionNo,
          judges: s.judges, hostClub: null,
        });
        s.id = saved.id;
      }
      ids.push(s.id);
    }
    if (ids.length === 0) return 0;
    const sql = `LOAD DATA LOCAL INFILE 'staged-results.tsv' IGNORE INTO TABLE show_result
      CHARACTER SET utf8mb4 FIELDS TERMINATED BY '\\t' ESCAPED BY '\\\\' LINES TERMINATED BY '\\n'
      (@show_index, animal_id, ear_id, exhibitor, breed, variety, sex, age_class, entries_in_class,
       exhibitors_in_class, placing, awards, judge, @dedupe_hex)
      SET dedupe_key = UNHEX(@dedupe_hex), show_id = ELT(@show_index, ${ids.join(',')}), import_job_id = ${Number(this.ctx.jobId)}`;
    const { size } = await stat(this.tsvPath);
    const conn = await tx.queryRunner!.connect();
    const result = await new Promise<{ affectedRows: number }>((resolve, reject) => {
      conn.query({ sql, infileStreamFactory: () => createReadStream(this.tsvPath, { highWaterMark: 1 << 20 }).pipe(counted(size, progress)) },
        (err: Error | null, res: { affectedRows: number }) => (err ? reject(err) : resolve(res)));
    });
    return result.affectedRows;
  }
}

/** Passes the staged file to the server unchanged, reporting the share sent and the lines in it. */
function counted(size: number, progress: CommitProgress): Transform {
  let bytes = 0;
  let lines = 0;
  return new Transform({
    transform(piece: Buffer, _enc, done) {
      bytes += piece.length;
      for (let at = piece.indexOf(10); at !== -1; at = piece.indexOf(10, at + 1)) lines++;
      progress(size ? bytes / size : 1, lines);
      done(null, piece);
    },
  });
}

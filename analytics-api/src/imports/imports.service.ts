import { mkdir, rm, rename } from 'node:fs/promises';
import { join } from 'node:path';
import Papa from 'papaparse';
import type { DataSource } from 'typeorm';
import type { ImportCheckOptions, ImportJob as ImportJobDto, ImportSummary, RowProblem } from '@shared/contracts/imports';
import { dedupeKeyer } from '@shared/imports/dedupe-key';
import { importKind, type ImportKindKey } from '@shared/imports/import-kinds';
import { suggestMapping } from '@shared/imports/suggest-mapping';
import { ImportJob } from '../db/entities/import-job.entity';
import { SavedMapping } from '../db/entities/saved-mapping.entity';
import { User } from '../db/entities/user.entity';
import { AppError, notFound } from '../http/app-error';
import { columnIndex, csvRows, sniffCsv } from './csv-file';
import { dedupeHash } from './dedupe-hash';
import { HashRowSet } from './hash-row-set';
import { createHerdImporter, evaluationTraitsFor } from './herd-importers';
import { JobProgress } from './job-progress';
import type { CheckReport, ImporterContext, KindImporter } from './kind-importer';
import { ResultsImporter } from './results-importer';

export type Scope = { type: 'rabbitry' | 'club'; id: number };
const PROBLEMS_IN_SUMMARY = 200;

export const kindsFor = (scope: Scope['type']): ImportKindKey[] =>
  scope === 'club' ? ['results'] : ['animals', 'weights', 'litters', 'evaluations'];

/**
 * The import wizard's server side: upload (sniff and store the file), check (read every row,
 * report each problem, count new and already-present records), commit (one transaction: all
 * accepted rows or none). Checking and committing run in the background and report progress
 * on the job row, so any API process can answer a poll.
 */
export class ImportsService {
  private readonly dir: string;

  constructor(private readonly db: DataSource, dataDir: string, private readonly today: () => string = todayIso) {
    this.dir = join(dataDir, 'imports');
  }

  async upload(scope: Scope, userId: number, kind: ImportKindKey, file: { path: string; originalname: string }): Promise<ImportJobDto> {
    if (!kindsFor(scope.type).includes(kind)) {
      throw new AppError('validation', `A ${scope.type} imports ${kindsFor(scope.type).join(', ')}, not ${kind}`, 400, { kind: 'not allowed here' });
    }
    let shape;
    try {
      shape = await sniffCsv(file.path);
    } catch (e) {
      await rm(file.path, { force: true });
      throw e;
    }
    await mkdir(this.dir, { recursive: true });
    const saved = await this.db.getRepository(SavedMapping).findOneBy({ userId, kind });
    const evaluationTraits = kind === 'evaluations' ? await evaluationTraitsFor(this.db, scope.id) : null;
    const suggestion = suggestMapping(kind, shape.headers, evaluationTraits ?? undefined).fields;
    // A remembered mapping wins where its headers occur in this file.
    const remembered = Object.fromEntries(Object.entries(saved?.mapping ?? {}).filter(([, h]) => shape.headers.includes(h)));
    const job = await this.db.getRepository(ImportJob).save({
      kind, scopeType: scope.type, scopeId: scope.id, userId, fileName: file.originalname.slice(0, 255), status: 'uploaded',
      encoding: shape.encoding, delimiter: shape.delimiter, headers: shape.headers, sampleRows: shape.sampleRows,
      suggestedMapping: { ...suggestion, ...remembered }, mapping: null, options: null, summary: null, evaluationTraits,
    });
    const filePath = join(this.dir, `job-${job.id}.csv`);
    await rename(file.path, filePath);
    await this.db.getRepository(ImportJob).update({ id: job.id }, { filePath });
    return this.get(scope, job.id);
  }

  async get(scope: Scope, jobId: number): Promise<ImportJobDto> {
    const job = await this.db.getRepository(ImportJob).findOneBy({ id: jobId, scopeType: scope.type, scopeId: scope.id });
    if (!job) throw notFound('Import');
    const user = await this.db.getRepository(User).findOneBy({ id: job.userId });
    return toDto(job, user?.displayName ?? null);
  }

  async history(scope: Scope): Promise<ImportJobDto[]> {
    const jobs = await this.db.getRepository(ImportJob).find({ where: { scopeType: scope.type, scopeId: scope.id }, order: { id: 'DESC' }, take: 100 });
    const users = new Map((await this.db.getRepository(User).find()).map((u) => [u.id, u.displayName]));
    return jobs.map((j) => toDto(j, users.get(j.userId) ?? null));
  }

  async errorReport(scope: Scope, jobId: number): Promise<{ fileName: string; csv: string }> {
    const job = await this.db.getRepository(ImportJob).findOneBy({ id: jobId, scopeType: scope.type, scopeId: scope.id });
    if (!job) throw notFound('Import');
    return { fileName: `${job.fileName.replace(/\.[^.]*$/, '')}-problems.csv`, csv: job.errorReport ?? 'row,column,severity,problem\n' };
  }

  /** Starts the check in the background; the caller polls `get`. */
  async startCheck(scope: Scope, jobId: number, userId: number, unitSetting: 'lb-oz' | 'kg', options: ImportCheckOptions): Promise<ImportJobDto> {
    const job = await this.claim(scope, jobId, ['uploaded', 'checked', 'failed'], 'checking');
    const kind = job.kind as ImportKindKey;
    const known = new Set(importKind(kind, job.evaluationTraits ?? undefined).fields.map((f) => f.key));
    const unknown = Object.keys(options.mapping).filter((k) => !known.has(k));
    const missingHeaders = Object.values(options.mapping).filter((h) => h && !job.headers!.includes(h));
    if (unknown.length || missingHeaders.length) {
      await this.fail(job.id, 'The column mapping names fields or columns this file does not have');
      throw new AppError('validation', 'The column mapping names fields or columns this file does not have', 400, { mapping: [...unknown, ...missingHeaders].join(', ') });
    }
    await this.db.getRepository(ImportJob).update({ id: job.id }, { mapping: options.mapping, options, processedRows: 0, progress: 0 });
    await this.db.getRepository(SavedMapping).upsert({ userId, kind, mapping: options.mapping }, ['userId', 'kind']);
    const ctx = this.importerContext(job, userId, unitSetting, options);
    this.background(job.id, async () => {
      const importer = kind === 'results' ? await ResultsImporter.forCheck(this.db, ctx) : await createHerdImporter(kind, this.db, ctx);
      const progress = new JobProgress(this.db, job.id);
      const { summary, report } = await this.checkRows({ ...job, options }, importer, (f, rows) => progress.report(f, rows));
      await progress.settled();
      await this.db.getRepository(ImportJob).update({ id: job.id }, {
        status: 'checked', summary, errorReport: report, totalRows: summary.totalRows, errorRows: summary.errorRows,
        processedRows: summary.totalRows, progress: null,
      });
    });
    return this.get(scope, jobId);
  }

  /** Starts the commit in the background: one transaction, all accepted rows or none. */
  async startCommit(scope: Scope, jobId: number, userId: number, unitSetting: 'lb-oz' | 'kg', skipRowsWithErrors: boolean): Promise<ImportJobDto> {
    const current = await this.db.getRepository(ImportJob).findOneBy({ id: jobId, scopeType: scope.type, scopeId: scope.id });
    if (!current) throw notFound('Import');
    if (current.status === 'checked' && current.summary!.errorRows > 0 && !skipRowsWithErrors) {
      throw new AppError('has-errors', `${current.summary!.errorRows} rows have errors: fix the file, or choose to leave those rows out`, 409);
    }
    const job = await this.claim(scope, jobId, ['checked'], 'committing');
    await this.db.getRepository(ImportJob).update({ id: job.id }, { processedRows: 0, progress: 0 });
    const kind = job.kind as ImportKindKey;
    const ctx = this.importerContext(job, userId, unitSetting, job.options!);
    this.background(job.id, async () => {
      const progress = new JobProgress(this.db, job.id);
      let importer: KindImporter<ImportKindKey>;
      // Herd files are small: the commit checks them again against the database as it is now
      // (the first half of the bar), then writes (the second half).
      let written = (f: number, rows: number) => void progress.report(f, rows);
      if (kind === 'results') {
        importer = ResultsImporter.forCommit(this.db, ctx) as KindImporter<ImportKindKey>;
      } else {
        importer = await createHerdImporter(kind, this.db, ctx) as KindImporter<ImportKindKey>;
        await this.checkRows(job, importer, (f) => progress.report(f / 2, 0));
        written = (f, rows) => void progress.report(0.5 + f / 2, rows);
      }
      const added = await this.db.transaction((tx) => importer.commit(tx, written));
      await progress.settled();
      const summary = job.summary!;
      // Rows the check counted as new but another import added since then are present too.
      const present = summary.alreadyPresent + Math.max(0, summary.newRows - added);
      await this.db.getRepository(ImportJob).update({ id: job.id }, {
        status: 'done', newRows: added, processedRows: added, progress: null, duplicateRows: present + summary.duplicatesInFile, finishedAt: new Date(),
        message: `${added} new, ${present} already present${summary.duplicatesInFile ? `, ${summary.duplicatesInFile} repeated in the file` : ''}`,
      });
      await this.cleanUp(job);
    });
    return this.get(scope, jobId);
  }

  /** Resolves when the job has left its running state (used by the demo loader and tests). */
  async waitFor(scope: Scope, jobId: number): Promise<ImportJobDto> {
    for (;;) {
      const job = await this.get(scope, jobId);
      if (!['checking', 'committing'].includes(job.status)) return job;
      await new Promise((r) => setTimeout(r, 100));
    }
  }

  private importerContext(job: ImportJob, userId: number, unitSetting: 'lb-oz' | 'kg', options: ImportCheckOptions): ImporterContext {
    return {
      scopeId: job.scopeId, jobId: job.id, userId, options, columns: columnIndex(job.headers ?? [], options.mapping), unitSetting,
      today: this.today(), stagingDir: this.dir, mappedTraits: job.evaluationTraits ?? undefined,
    };
  }

  /**
   * The common loop of every kind: read, validate, drop in-file duplicates, classify. Reports
   * the share of the file read after each chunk (see csvRows).
   */
  private async checkRows(job: ImportJob, importer: KindImporter<ImportKindKey>, progress: (fraction: number, rows: number) => Promise<unknown>) {
    const problems: RowProblem[] = [];
    const reportLines: string[] = [];
    const rowsWithError = new Set<number>();
    const rowsWithWarning = new Set<number>();
    const report: CheckReport = {
      newRows: 0, alreadyPresent: 0, skippedRows: 0, stubsToCreate: 0,
      problem(row, field, message, severity) {
        if (problems.length < PROBLEMS_IN_SUMMARY) problems.push({ row, field, message, severity });
        reportLines.push(Papa.unparse([[row, field, severity, message]], { escapeFormulae: true }));
        (severity === 'error' ? rowsWithError : rowsWithWarning).add(row);
      },
    };
    const seen = new HashRowSet();
    const keyOf = dedupeKeyer(job.kind as ImportKindKey);
    let total = 0;
    let duplicatesInFile = 0;
    for await (const chunk of csvRows(job.filePath!, { encoding: job.encoding as 'utf-8', delimiter: job.delimiter! })) {
      for (let i = 0; i < chunk.rows.length; i++) {
        const row = chunk.firstRow + i;
        const v = importer.validate(chunk.rows[i]!);
        for (const e of v.errors) report.problem(row, e.field, e.message, 'error');
        for (const w of v.warnings) report.problem(row, w.field, w.message, 'warning');
        if (!v.value) continue;
        const hash = dedupeHash(keyOf(v.value));
        const first = seen.add(hash, row);
        if (first !== undefined) {
          duplicatesInFile++;
          report.problem(row, '', `the same record as row ${first}: counted once`, 'warning');
          continue;
        }
        importer.accept(v.value, row, hash, report);
      }
      total += chunk.rows.length;
      await importer.endChunk?.();
      await progress(chunk.bytesRead / chunk.fileBytes, total);
    }
    await importer.finishCheck(report);
    if (total === 0) throw new AppError('no-rows', 'The file has no rows of data', 400);
    const summary: ImportSummary = {
      totalRows: total, newRows: report.newRows, alreadyPresent: report.alreadyPresent, duplicatesInFile,
      errorRows: rowsWithError.size, warningRows: rowsWithWarning.size, skippedRows: report.skippedRows,
      stubsToCreate: report.stubsToCreate, problems,
    };
    return { summary, report: ['row,column,severity,problem', ...reportLines].join('\n') + '\n' };
  }

  /** Moves a job into a running state only from the states given (no double commit). */
  private async claim(scope: Scope, jobId: number, from: string[], to: 'checking' | 'committing'): Promise<ImportJob> {
    const repo = this.db.getRepository(ImportJob);
    const job = await repo.findOneBy({ id: jobId, scopeType: scope.type, scopeId: scope.id });
    if (!job) throw notFound('Import');
    const res = await repo.createQueryBuilder().update().set({ status: to, message: null })
      .where('id = :id AND status IN (:...from)', { id: jobId, from }).execute();
    if (!res.affected) throw new AppError('conflict', `This import is ${job.status}; it cannot be ${to === 'checking' ? 'checked' : 'committed'} now`, 409);
    return { ...job, status: to };
  }

  private background(jobId: number, work: () => Promise<void>): void {
    work().catch(async (e: unknown) => {
      const message = e instanceof AppError ? e.message : `The import stopped and nothing was saved: ${(e as Error).message}`;
      if (!(e instanceof AppError)) console.error(e);
      await this.fail(jobId, message);
    });
  }

  private async fail(jobId: number, message: string) {
    await this.db.getRepository(ImportJob).update({ id: jobId }, { status: 'failed', message: message.slice(0, 500), finishedAt: new Date() });
  }

  private async cleanUp(job: ImportJob) {
    await rm(job.filePath!, { force: true });
    if (job.kind === 'results') {
      for (const f of ResultsImporter.forCommit(this.db, this.importerContext(job, job.userId, 'kg', job.options!)).stagingFiles) await rm(f, { force: true });
    }
  }
}

function toDto(j: ImportJob, userName: string | null): ImportJobDto {
  return {
    id: j.id, kind: j.kind as ImportKindKey, scopeType: j.scopeType, scopeId: j.scopeId, fileName: j.fileName, status: j.status,
    encoding: j.encoding, delimiter: j.delimiter, headers: j.headers ?? [], sampleRows: j.sampleRows ?? [],
    suggestedMapping: j.suggestedMapping ?? {}, evaluationTraits: j.evaluationTraits ?? null, processedRows: j.processedRows,
    totalRows: j.totalRows, progress: ['checking', 'committing'].includes(j.status) ? j.progress ?? 0 : null, summary: j.summary,
    message: j.message, startedAt: new Date(j.startedAt).toISOString(), finishedAt: j.finishedAt ? new Date(j.finishedAt).toISOString() : null,
    userName,
  };
}

export const todayIso = () => new Date().toISOString().slice(0, 10);

import type { DataSource } from 'typeorm';
import { ImportJob } from '../db/entities/import-job.entity';

/**
 * Writes a running job's progress to its row, so that a poll to any API process sees it: the
 * share of the running step done (0–1) and the rows handled. Writes at most every `everyMs`
 * and one at a time, in order; `settled()` waits for the last one (call it before the job's
 * final update, which must not be overtaken by a late progress write).
 */
export class JobProgress {
  private lastWrite = -Infinity;
  private writing: Promise<unknown> = Promise.resolve();

  constructor(private readonly db: DataSource, private readonly jobId: number, private readonly everyMs = 200) {}

  report(fraction: number, rows: number): Promise<unknown> {
    const now = performance.now();
    if (now - this.lastWrite < this.everyMs) return this.writing;
    this.lastWrite = now;
    const progress = Math.min(1, Math.max(0, fraction));
    this.writing = this.writing.then(() => this.db.getRepository(ImportJob).update({ id: this.jobId }, { progress, processedRows: rows }));
    return this.writing;
  }

  settled(): Promise<unknown> {
    return this.writing;
  }
}

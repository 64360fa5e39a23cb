import { hash } from 'node:crypto';

/** The 20-byte SHA-1 of a record's dedupe key, as stored in show_result.dedupe_key. One-shot: no Hash object per row. O(length). */
export const dedupeHash = (key: string): Buffer => hash('sha1', key, 'buffer');

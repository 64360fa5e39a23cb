import { createHash } from 'node:crypto';

/** The 40-hex SHA-1 of a record's dedupe key, as stored in show_result.dedupe_key. O(length). */
export const dedupeHash = (key: string): string => createHash('sha1').update(key).digest('hex');

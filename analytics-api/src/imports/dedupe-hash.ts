import { hash } from 'node:crypto';

/**
 * The 40-hex SHA-1 of a record's dedupe key (show_result.dedupe_key holds its 20 bytes).
 * One-shot and to hex: about half the cost of a Hash object or a Buffer per row. O(length).
 */
export const dedupeHash = (key: string): string => hash('sha1', key, 'hex');

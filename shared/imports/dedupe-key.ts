import type { ImportKindKey } from './import-kinds';
import type { ImportRecords } from './import-records';

/** Leading, trailing or repeated whitespace, or whitespace other than a plain space. */
const UNTIDY_SPACE = /^\s|\s$|\s\s|[^\S ]/;

/** Trimmed, single spaces, lower case. Most cells are tidy already and skip the rewrite. O(length). */
const norm = (s: string | null | undefined): string => {
  if (!s) return '';
  return (UNTIDY_SPACE.test(s) ? s.trim().replace(/\s+/g, ' ') : s).toLowerCase();
};

/**
 * The key that identifies a record of a kind, so that importing the same file twice adds
 * nothing: animals by ear ID; weights and evaluations by ear ID + date; litters by litter code;
 * show results by show name + show date + breed + variety + sex + age class + placing +
 * (ear ID, or the exhibitor when the animal has none). Text is compared trimmed, with single
 * spaces and without case. Parts are joined with '|'. Cost O(length of the parts).
 */
export function dedupeKey<K extends ImportKindKey>(kind: K, value: ImportRecords[K]): string {
  switch (kind) {
    case 'animals':
      return norm((value as ImportRecords['animals']).earId);
    case 'weights': {
      const v = value as ImportRecords['weights'];
      return `${norm(v.earId)}|${norm(v.weighedOn)}`;
    }
    case 'litters':
      return norm((value as ImportRecords['litters']).litterCode);
    case 'evaluations': {
      const v = value as ImportRecords['evaluations'];
      return `${norm(v.earId)}|${norm(v.evaluatedOn)}`;
    }
    default: {
      // One template string: this runs once per row of files of a million results.
      const v = value as ImportRecords['results'];
      const who = v.earId ? `ear:${norm(v.earId)}` : `exhibitor:${norm(v.exhibitor)}`;
      return `${norm(v.showName)}|${norm(v.showDate)}|${norm(v.breed)}|${norm(v.variety)}|${norm(v.sex)}|${norm(v.ageClass)}|${v.placing}|${who}`;
    }
  }
}

import type { ImportKindKey } from './import-kinds';
import type { ImportRecords } from './import-records';

/** Leading, trailing or repeated whitespace, or whitespace other than a plain space. */
const UNTIDY_SPACE = /^\s|\s$|\s\s|[^\S ]/;

/** Trimmed, single spaces, lower case. Most cells are tidy already and skip the rewrite. O(length). */
const norm = (s: string | null | undefined): string => {
  if (!s) return '';
  return (UNTIDY_SPACE.test(s) ? s.trim().replace(/\s+/g, ' ') : s).toLowerCase();
};

/** norm, remembering the last value: shows, dates, breeds and classes repeat down a column. */
function rememberingNorm(): (s: string | null | undefined) => string {
  let lastIn: string | null | undefined;
  let lastOut = '';
  return (s) => (s === lastIn ? lastOut : ((lastIn = s), (lastOut = norm(s))));
}

/**
 * The key that identifies a record of a kind, so that importing the same file twice adds
 * nothing: animals by ear ID; weights and evaluations by ear ID + date; litters by litter code;
 * show results by show name + show date + breed + variety + sex + age class + placing +
 * (ear ID, or the exhibitor when the animal has none). Text is compared trimmed, with single
 * spaces and without case. Parts are joined with '|'. Returns the key function for one file
 * (it remembers each part's last value). Cost O(length of the parts) a record.
 */
export function dedupeKeyer<K extends ImportKindKey>(kind: K): (value: ImportRecords[K]) => string {
  const [a, b, c, d, e, f, g] = Array.from({ length: 7 }, rememberingNorm);
  switch (kind) {
    case 'animals':
      return (value) => a((value as ImportRecords['animals']).earId);
    case 'weights':
      return (value) => {
        const v = value as ImportRecords['weights'];
        return `${a(v.earId)}|${b(v.weighedOn)}`;
      };
    case 'litters':
      return (value) => a((value as ImportRecords['litters']).litterCode);
    case 'evaluations':
      return (value) => {
        const v = value as ImportRecords['evaluations'];
        return `${a(v.earId)}|${b(v.evaluatedOn)}`;
      };
    default:
      return (value) => {
        const v = value as ImportRecords['results'];
        const who = v.earId ? `ear:${g(v.earId)}` : `exhibitor:${g(v.exhibitor)}`;
        return `${a(v.showName)}|${b(v.showDate)}|${c(v.breed)}|${d(v.variety)}|${e(v.sex)}|${f(v.ageClass)}|${v.placing}|${who}`;
      };
  }
}

/** The dedupe key of one record (see dedupeKeyer). */
export function dedupeKey<K extends ImportKindKey>(kind: K, value: ImportRecords[K]): string {
  return dedupeKeyer(kind)(value);
}

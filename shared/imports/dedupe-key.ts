import type { ImportKindKey } from './import-kinds';
import type { ImportRecords } from './import-records';

const norm = (s: string | null | undefined) => (s ?? '').trim().replace(/\s+/g, ' ').toLowerCase();

/**
 * The key that identifies a record of a kind, so that importing the same file twice adds
 * nothing: animals by ear ID; weights and evaluations by ear ID + date; litters by litter code;
 * show results by show name + show date + breed + variety + sex + age class + placing +
 * (ear ID, or the exhibitor when the animal has none). Text is compared trimmed, with single
 * spaces and without case. Parts are joined with '|'. Cost O(length of the parts).
 */
export function dedupeKey<K extends ImportKindKey>(kind: K, value: ImportRecords[K]): string {
  const parts = ((): (string | number | null)[] => {
    switch (kind) {
      case 'animals': {
        const v = value as ImportRecords['animals'];
        return [v.earId];
      }
      case 'weights': {
        const v = value as ImportRecords['weights'];
        return [v.earId, v.weighedOn];
      }
      case 'litters': {
        const v = value as ImportRecords['litters'];
        return [v.litterCode];
      }
      case 'evaluations': {
        const v = value as ImportRecords['evaluations'];
        return [v.earId, v.evaluatedOn];
      }
      default: {
        const v = value as ImportRecords['results'];
        const who = v.earId ? `ear:${v.earId}` : `exhibitor:${norm(v.exhibitor)}`;
        return [v.showName, v.showDate, v.breed, v.variety, v.sex, v.ageClass, v.placing, who];
      }
    }
  })();
  return parts.map((p) => norm(typeof p === 'number' ? String(p) : p)).join('|');
}

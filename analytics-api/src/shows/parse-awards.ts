import { type Award, AWARDS } from '@shared/domain/awards';

/**
 * The award codes of a stored result ("BOV BOB", space-separated, as the importer writes them);
 * unknown words are ignored. Cost O(length). Never throws.
 */
export function parseAwards(stored: string | null): Award[] {
  return (stored ?? '').split(/\s+/).map((w) => w.toUpperCase()).filter((w): w is Award => (AWARDS as readonly string[]).includes(w));
}

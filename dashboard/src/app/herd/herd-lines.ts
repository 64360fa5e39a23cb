import type { HerdLine } from '@shared/contracts/animals';

/**
 * The herd's lines that hold the typed text (any case): those starting with it first, then the
 * rest, each group in the API's order (most animals first); every line when nothing is typed.
 * O(n) for n lines.
 */
export function linesMatching(lines: readonly HerdLine[], typed: string, limit = 10): HerdLine[] {
  const text = typed.trim().toLowerCase();
  if (text === '') return lines.slice(0, limit);
  const starts = lines.filter((l) => l.line.toLowerCase().startsWith(text));
  const holds = lines.filter((l) => !l.line.toLowerCase().startsWith(text) && l.line.toLowerCase().includes(text));
  return [...starts, ...holds].slice(0, limit);
}

/** "24 animals, 18 active · 2 outside parents": what an option of the line list says beside the name. */
export function lineCounts(l: HerdLine): string {
  const animals = `${l.animals} ${l.animals === 1 ? 'animal' : 'animals'}${l.animals ? `, ${l.active} active` : ''}`;
  return l.outside ? `${animals} · ${l.outside} outside ${l.outside === 1 ? 'parent' : 'parents'}` : animals;
}

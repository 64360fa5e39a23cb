export interface LitterFacts {
  bredOn: string | null;
  kindledOn: string | null;
  bornAlive: number | null;
  weaned: number | null;
  kitsRecorded: number;
}

/**
 * What makes a litter record impossible, by field: kindled before bred, more weaned than born
 * alive, or fewer born alive than kits already recorded. Empty when consistent.
 * Cost O(1). Never throws.
 */
export function litterProblems(l: LitterFacts): Record<string, string> {
  const p: Record<string, string> = {};
  if (l.bredOn && l.kindledOn && l.kindledOn < l.bredOn) p.kindledOn = `Kindled on ${l.kindledOn}, before the bred date ${l.bredOn}`;
  if (l.weaned !== null && l.bornAlive !== null && l.weaned > l.bornAlive) p.weaned = `${l.weaned} weaned is more than the ${l.bornAlive} born alive`;
  if (l.weaned !== null && l.bornAlive === null) p.bornAlive = 'Record how many were born alive before how many were weaned';
  if (l.bornAlive !== null && l.kitsRecorded > l.bornAlive) p.bornAlive = `${l.kitsRecorded} kits of this litter are recorded, more than ${l.bornAlive} born alive`;
  return p;
}

import type { AnimalLitter } from '@shared/contracts/animals';

/**
 * A litter's dates and counts in a line: "bred 2026-06-01, kindled 2026-07-02 · 5 born alive,
 * 1 dead · 5 weaned · 3 kits recorded"; what is not recorded is left out.
 */
export function litterWords(l: AnimalLitter): string {
  const dates = [l.bredOn && `bred ${l.bredOn}`, l.kindledOn ? `kindled ${l.kindledOn}` : l.bredOn ? 'not kindled yet' : null].filter(Boolean).join(', ');
  const born = l.bornAlive === null && l.bornDead === null ? null
    : [l.bornAlive !== null && `${l.bornAlive} born alive`, l.bornDead !== null && `${l.bornDead} dead`].filter(Boolean).join(', ');
  return [
    dates || null,
    born,
    l.weaned !== null ? `${l.weaned} weaned` : null,
    l.kitsRecorded ? `${l.kitsRecorded} ${l.kitsRecorded === 1 ? 'kit' : 'kits'} recorded` : null,
  ].filter(Boolean).join(' · ');
}

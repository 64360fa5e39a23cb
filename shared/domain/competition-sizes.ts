import type { AgeClass, Sex } from './terms';

export interface CompetitionSize {
  entries: number;
  exhibitors: number;
}

export interface CompetitionSizes {
  variety: CompetitionSize;
  breed: CompetitionSize;
  show: CompetitionSize;
}

/** One result line of a show, as far as the sizes of its competitions are concerned. */
export interface ClassResultLine {
  breed: string;
  variety: string | null;
  sex: Sex;
  ageClass: AgeClass;
  entriesInClass: number;
  exhibitorsInClass: number;
}

/**
 * The size of the variety, breed and show competitions each result line took part in,
 * derived from the class sizes of one show's results:
 * - a class is one (breed, variety, sex, age class); its entries and exhibitors are the largest
 *   values any of its lines report (lines of one class normally agree);
 * - variety competition: entries = Σ class entries over the classes of that breed + variety,
 *   exhibitors = max class exhibitors over those classes;
 * - breed competition: the same over all classes of the breed; show: over all classes.
 * Exhibitor counts are a lower bound: results say how many exhibitors were in each class but
 * not who, so one exhibitor showing in two classes cannot be told from two exhibitors.
 * Breed and variety names are compared case-insensitively, trimmed.
 * Cost O(n) for n lines. Throws `competitionSizes requires whole, non-negative class sizes`.
 */
export function competitionSizes(lines: readonly ClassResultLine[]): CompetitionSizes[] {
  const norm = (s: string | null) => (s ?? '').trim().toLowerCase();
  const classes = new Map<string, { breed: string; variety: string; entries: number; exhibitors: number }>();
  for (const line of lines) {
    if (![line.entriesInClass, line.exhibitorsInClass].every((v) => Number.isInteger(v) && v >= 0)) {
      throw new Error('competitionSizes requires whole, non-negative class sizes');
    }
    const breed = norm(line.breed);
    const variety = norm(line.variety);
    const key = [breed, variety, line.sex, line.ageClass].join('\u0000');
    const c = classes.get(key);
    if (c) {
      c.entries = Math.max(c.entries, line.entriesInClass);
      c.exhibitors = Math.max(c.exhibitors, line.exhibitorsInClass);
    } else {
      classes.set(key, { breed, variety, entries: line.entriesInClass, exhibitors: line.exhibitorsInClass });
    }
  }
  const varieties = new Map<string, CompetitionSize>();
  const breeds = new Map<string, CompetitionSize>();
  const show: CompetitionSize = { entries: 0, exhibitors: 0 };
  const add = (into: CompetitionSize, c: CompetitionSize) => {
    into.entries += c.entries;
    into.exhibitors = Math.max(into.exhibitors, c.exhibitors);
  };
  for (const c of classes.values()) {
    const vKey = `${c.breed}\u0000${c.variety}`;
    if (!varieties.has(vKey)) varieties.set(vKey, { entries: 0, exhibitors: 0 });
    if (!breeds.has(c.breed)) breeds.set(c.breed, { entries: 0, exhibitors: 0 });
    add(varieties.get(vKey)!, c);
    add(breeds.get(c.breed)!, c);
    add(show, c);
  }
  return lines.map((line) => ({
    variety: { ...varieties.get(`${norm(line.breed)}\u0000${norm(line.variety)}`)! },
    breed: { ...breeds.get(norm(line.breed))! },
    show: { ...show },
  }));
}

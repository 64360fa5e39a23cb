import type { HerdLine } from '@shared/contracts/animals';
import { lineCounts, linesMatching } from './herd-lines';

const line = (name: string, animals = 3, active = 2, outside = 0): HerdLine => ({ line: name, animals, active, outside });

describe('herd lines', () => {
  const lines = [line('Ember', 24, 18, 2), line('Hollow Ember'), line('Marsh Gate'), line('emberly')];

  it('offers the lines that start with the typed text first, then those holding it, any case', () => {
    expect(linesMatching(lines, ' EMB').map((l) => l.line)).toEqual(['Ember', 'emberly', 'Hollow Ember']);
    expect(linesMatching(lines, 'gate').map((l) => l.line)).toEqual(['Marsh Gate']);
    expect(linesMatching(lines, '')).toHaveLength(4);
    expect(linesMatching(lines, '', 2)).toHaveLength(2);
    expect(linesMatching(lines, 'zz')).toEqual([]);
  });

  it('says how many animals carry a line', () => {
    expect(lineCounts(lines[0]!)).toBe('24 animals, 18 active · 2 outside parents');
    expect(lineCounts(line('Solo', 1, 0, 0))).toBe('1 animal, 0 active');
    expect(lineCounts(line('Stubs only', 0, 0, 1))).toBe('0 animals · 1 outside parent');
  });
});

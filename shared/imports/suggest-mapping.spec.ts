import { describe, expect, it } from 'vitest';
import { normaliseHeader } from './import-kinds';
import { suggestMapping } from './suggest-mapping';

describe('suggestMapping', () => {
  it('normalises case, spaces, underscores and #', () => {
    expect(normaliseHeader('  Ear_ID ')).toBe('ear id');
    expect(normaliseHeader('Ear #')).toBe('ear no');
    expect(normaliseHeader('Date-of-Birth')).toBe('date of birth');
    expect(normaliseHeader('Ears & Crown')).toBe('ears & crown');
  });

  it('maps canonical headers exactly and leaves nothing unmatched', () => {
    const s = suggestMapping('weights', ['ear_id', 'weighed_on', 'weight', 'notes']);
    expect(s).toEqual({
      fields: { ear_id: 'ear_id', weighed_on: 'weighed_on', weight: 'weight', notes: 'notes' },
      unmatchedHeaders: [],
      missingRequired: [],
    });
  });

  it('matches a secretary’s own headers through aliases', () => {
    const s = suggestMapping('results', ['Show', 'Date', 'Judge', 'Exhibitor', 'Breed', 'Color', 'Sex', 'Class', 'Entries', 'Exhibitors', 'Place', 'Tattoo', 'Misc']);
    expect(s.fields).toMatchObject({
      show_name: 'Show', show_date: 'Date', variety: 'Color', age_class: 'Class', entries_in_class: 'Entries',
      exhibitors_in_class: 'Exhibitors', placing: 'Place', ear_id: 'Tattoo',
    });
    expect(s.unmatchedHeaders).toEqual(['Misc']);
    expect(s.missingRequired).toEqual([]);
  });

  it('says which required fields or groups no header matched', () => {
    expect(suggestMapping('weights', ['Tattoo', 'Date']).missingRequired).toEqual(['weight or weight_g']);
    expect(suggestMapping('litters', ['Litter', 'Buck']).missingRequired).toEqual(['dam_ear_id']);
  });

  it('matches evaluation trait labels of the template', () => {
    const s = suggestMapping('evaluations', ['Ear', 'Date', 'Ears & Crown', 'Body Type', 'Fur']);
    expect(s.fields).toMatchObject({ ear_id: 'Ear', evaluated_on: 'Date', ears_crown: 'Ears & Crown', body_type: 'Body Type', fur: 'Fur' });
  });

  it('uses each header once', () => {
    const s = suggestMapping('animals', ['Sire', 'Dam', 'ID']);
    expect(s.fields).toEqual({ sire_ear_id: 'Sire', dam_ear_id: 'Dam', ear_id: 'ID' });
  });
});

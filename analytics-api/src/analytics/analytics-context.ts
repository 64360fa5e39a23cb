import type { AnalyticsScope } from '@shared/contracts/analytics';
import type { AnimalShowRecord } from '../shows/build-show-records';
import type { CacheEntry } from './analytics-cache';
import { type HerdData, pedigreeIndex, type PedigreeIndex } from './herd-data';
import { traitValues, type TraitValues } from './trait-values';

/**
 * What a herd report is computed from: the route's rabbitry (`herd`), the scope the estimate
 * pools (`scope`: the herd itself, or every rabbitry the caller may see), and the pool of every
 * rabbitry the caller may see (`visible`, for growth references and heritabilities).
 */
export interface HerdContext {
  rabbitryId: number;
  asOf: string;
  herd: CacheEntry<HerdData>;
  scope: CacheEntry<HerdData>;
  visible: CacheEntry<HerdData>;
  scopeInfo: AnalyticsScope;
  /** Legs and grand champion status of the herd's animals (shows/load-show-records), memoized. */
  showRecords(): Promise<Map<number, AnimalShowRecord>>;
}

export const pedigreeOf = (entry: CacheEntry<HerdData>): PedigreeIndex => entry.memo('pedigree', () => pedigreeIndex(entry.data));
export const traitOf = (entry: CacheEntry<HerdData>, trait: string): TraitValues => entry.memo(`trait:${trait}`, () => traitValues(entry.data, trait));

/** Scope description in words, from the rabbitries it holds. */
export function describeScope(data: HerdData, pooled: boolean): AnalyticsScope {
  const names = data.rabbitries.map((r) => r.name);
  if (!pooled) return { kind: 'rabbitry', rabbitries: data.rabbitries, description: `${names[0] ?? 'This rabbitry'} only.` };
  return {
    kind: 'pooled',
    rabbitries: data.rabbitries,
    description: names.length === 1
      ? `Pooled over the one rabbitry you may see: ${names[0]}.`
      : `Pooled over the ${names.length} rabbitries you may see: ${names.join(', ')}.`,
  };
}

/** First letter up, full stop at the end: engine warnings read as sentences. */
export function sentence(text: string): string {
  const t = text.trim();
  if (t === '') return t;
  const s = t[0]!.toUpperCase() + t.slice(1);
  return /[.!?]$/.test(s) ? s : `${s}.`;
}

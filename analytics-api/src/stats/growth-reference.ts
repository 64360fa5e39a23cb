import type { Lms } from './lms';

/** The centiles drawn as growth bands. */
export const GROWTH_CENTILES = [3, 10, 25, 50, 75, 90, 97] as const;
export type GrowthCentile = (typeof GROWTH_CENTILES)[number];

export interface GrowthBand {
  /** ages fromDays ≤ age < toDays */
  fromDays: number;
  toDays: number;
  /** mean age of the band's weighings (the band centre when empty) */
  midDays: number;
  n: number;
  /** 'empirical' when the band has too few weights for an LMS fit; null otherwise */
  fallback: 'empirical' | null;
  /** LMS fitted to this band alone, and after smoothing across bands (null for empirical bands) */
  raw: Lms | null;
  lms: Lms | null;
  /** grams at each centile (null for an empty band) */
  centiles: Record<GrowthCentile, number> | null;
  /** sorted weights of an empirical band (null for LMS bands) */
  weights: number[] | null;
}

export interface GrowthReference {
  fromDays: number;
  toDays: number;
  /** contiguous, youngest first; widths may differ */
  bands: GrowthBand[];
  warnings: string[];
}

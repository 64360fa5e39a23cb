import * as z from 'zod';

/** Show awards above class placings, by the trade's abbreviations. */
export const AWARDS = ['BOV', 'BOSV', 'BOB', 'BOSB', 'BIS'] as const;
export type Award = (typeof AWARDS)[number];
export const awardSchema = z.enum(AWARDS);

export const AWARD_LABELS: Record<Award, string> = {
  BOV: 'Best of variety',
  BOSV: 'Best opposite sex of variety',
  BOB: 'Best of breed',
  BOSB: 'Best opposite sex of breed',
  BIS: 'Best in show',
};

/** Which competition an award is won in, for judging whether it was large enough for a leg. */
export const AWARD_COMPETITION: Record<Award, 'variety' | 'breed' | 'show'> = {
  BOV: 'variety',
  BOSV: 'variety',
  BOB: 'breed',
  BOSB: 'breed',
  BIS: 'show',
};

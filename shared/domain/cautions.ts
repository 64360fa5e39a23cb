/**
 * The usual cautions wherever Keeperline advises on breeding, handling or showing (DESIGN §3.10),
 * written once for the API's reports and the dashboard's notes. Common practice, no source: the
 * product supports the breeder's judgment and defers to veterinarians, the official breed standard
 * and local rules.
 */

/** What the numbers are for; said once beside every list of cautions. */
export const JUDGMENT_REMINDER =
  'These figures support your judgment; they do not replace a judge, the official breed standard or a veterinarian.';

const INBREEDING = 'Inbreeding tends to bring smaller litters and to intensify faults as well as virtues; line-breed with care.';
const BREEDING_AGE = 'Breed a doe only once she is old and big enough for her breed; ask a veterinarian about any health question.';
const HEAT = 'Heat stresses rabbits above about 80 °F (27 °C): avoid breeding, showing and travelling them in hot weather.';
const HANDLING = 'Support the hindquarters whenever you handle or pose a rabbit.';
const BIOSECURITY = 'Contagious disease travels with show stock: keep animals coming back from shows apart for a while, and follow local rules for sales, licensing and shows.';
const WEIGHT_CHECK = 'Weights and projections guide; check each animal on the scale and against the current official standard before a show.';
const LIKE_WITH_LIKE = 'Figures also carry how animals were fed, housed and shown, and which judges saw them: compare animals kept and shown alike.';
const SMALL_SAMPLES = 'Groups marked small have too few records to be trusted; look at the animals themselves.';

/** Beside advice on which animals to mate: the pairing planner, the inbreeding report. */
export const BREEDING_CAUTIONS: readonly string[] = [INBREEDING, BREEDING_AGE, HEAT, HANDLING];

/** Beside the keeper board: which juniors to keep, sell or show. */
export const KEEPER_CAUTIONS: readonly string[] = [WEIGHT_CHECK, BIOSECURITY, INBREEDING];

/** Beside the reports that pick parents: sires and dams, trait inheritance. */
export const SELECTION_CAUTIONS: readonly string[] = [LIKE_WITH_LIKE, INBREEDING, BREEDING_AGE, HANDLING];

/** Beside growth curves and projected weights. */
export const GROWTH_CAUTIONS: readonly string[] = [WEIGHT_CHECK, HEAT, HANDLING, BREEDING_AGE];

/** Beside a comparison of lines or rabbitries. */
export const LINE_CAUTIONS: readonly string[] = [LIKE_WITH_LIKE, SMALL_SAMPLES, INBREEDING];

/** Beside a club's season of shows. */
export const SHOW_CAUTIONS: readonly string[] = [BIOSECURITY, HEAT, HANDLING];

/** A list of cautions as a report sends it: the cautions, then the reminder. */
export const withJudgmentReminder = (cautions: readonly string[]): readonly string[] => [...cautions, JUDGMENT_REMINDER];

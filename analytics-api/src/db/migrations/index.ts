import { InitialSchema1796159474827 } from './1796159474827-initial-schema';

/** Every migration, in order. New ones are appended here. */
export const migrations = [InitialSchema1796159474827];

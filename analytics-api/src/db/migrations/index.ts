import { InitialSchema1796159474827 } from './1796159474827-initial-schema';
import { ImportJobDetails1796160000000 } from './1796160000000-import-job-details';

/** Every migration, in order. New ones are appended here. */
export const migrations = [InitialSchema1796159474827, ImportJobDetails1796160000000];

import { InitialSchema1796159474827 } from './1796159474827-initial-schema';
import { ImportJobDetails1796160000000 } from './1796160000000-import-job-details';
import { BinaryDedupeKey1796160100000 } from './1796160100000-binary-dedupe-key';
import { ImportJobProgressTraits1796160200000 } from './1796160200000-import-job-progress-traits';

/** Every migration, in order. New ones are appended here. */
export const migrations = [InitialSchema1796159474827, ImportJobDetails1796160000000, BinaryDedupeKey1796160100000, ImportJobProgressTraits1796160200000];

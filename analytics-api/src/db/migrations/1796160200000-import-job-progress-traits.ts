import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The share of a running check or commit done (0–1), so the wizard can fill its bar; and for
 * evaluations files, the trait columns the herd's breed templates offer for mapping.
 */
export class ImportJobProgressTraits1796160200000 implements MigrationInterface {
  name = 'ImportJobProgressTraits1796160200000';

  async up(q: QueryRunner): Promise<void> {
    await q.query('ALTER TABLE `import_job` ADD `progress` double NULL, ADD `evaluation_traits` json NULL');
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('ALTER TABLE `import_job` DROP `progress`, DROP `evaluation_traits`');
  }
}

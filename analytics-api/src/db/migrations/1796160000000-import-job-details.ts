import type { MigrationInterface, QueryRunner } from 'typeorm';

/** What the import wizard needs between its steps: the stored file, its sniffed form, the check's summary. */
export class ImportJobDetails1796160000000 implements MigrationInterface {
  name = 'ImportJobDetails1796160000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE \`import_job\`
      ADD \`file_path\` varchar(500) NULL,
      ADD \`encoding\` varchar(20) NULL,
      ADD \`delimiter\` varchar(4) NULL,
      ADD \`headers\` json NULL,
      ADD \`sample_rows\` json NULL,
      ADD \`suggested_mapping\` json NULL,
      ADD \`options\` json NULL,
      ADD \`summary\` json NULL`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE \`import_job\` DROP \`file_path\`, DROP \`encoding\`, DROP \`delimiter\`, DROP \`headers\`,
      DROP \`sample_rows\`, DROP \`suggested_mapping\`, DROP \`options\`, DROP \`summary\``);
  }
}

import { MigrationInterface, QueryRunner } from "typeorm";

export class InitialSchema1796159474827 implements MigrationInterface {
    name = 'InitialSchema1796159474827'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE \`animal\` (\`id\` int NOT NULL AUTO_INCREMENT, \`rabbitry_id\` int NOT NULL, \`ear_id\` varchar(32) NOT NULL, \`name\` varchar(120) NULL, \`sex\` varchar(4) NOT NULL, \`breed_id\` int NULL, \`variety\` varchar(80) NULL, \`birth_date\` date NULL, \`sire_id\` int NULL, \`dam_id\` int NULL, \`litter_id\` int NULL, \`line\` varchar(80) NULL, \`status\` varchar(10) NOT NULL DEFAULT 'active', \`registration_no\` varchar(40) NULL, \`grand_champion\` tinyint NOT NULL DEFAULT 0, \`breeder\` varchar(120) NULL, \`is_stub\` tinyint NOT NULL DEFAULT 0, \`stub_weight_grams\` int NULL, \`photo_path\` varchar(255) NULL, \`notes\` text NULL, \`keeper_decision\` varchar(10) NULL, \`created_at\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), \`updated_at\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6), INDEX \`IDX_3edfe95e88e6d20c00de01a1d3\` (\`breed_id\`), INDEX \`IDX_b6eb1a6ac1d293a31e5a529d98\` (\`sire_id\`), INDEX \`IDX_ef11a7f04ad2665a9586deadc2\` (\`dam_id\`), UNIQUE INDEX \`IDX_39769159b7fb4638b9a97578c4\` (\`rabbitry_id\`, \`ear_id\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`animal_status_change\` (\`id\` int NOT NULL AUTO_INCREMENT, \`animal_id\` int NOT NULL, \`status\` varchar(10) NOT NULL, \`changed_on\` date NOT NULL, \`note\` varchar(255) NULL, \`user_id\` int NULL, \`created_at\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_794216b6ad80e3b1d60b6be5ae\` (\`animal_id\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`breed\` (\`id\` int NOT NULL AUTO_INCREMENT, \`name\` varchar(80) NOT NULL, \`class_scheme\` varchar(12) NOT NULL, \`weight_limits\` json NOT NULL, \`varieties\` json NOT NULL, \`evaluation_template\` json NOT NULL, \`source_note\` varchar(255) NULL, UNIQUE INDEX \`IDX_114e1e2099cad7d73a7f011960\` (\`name\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`club\` (\`id\` int NOT NULL AUTO_INCREMENT, \`name\` varchar(120) NOT NULL, \`region\` varchar(120) NULL, \`season_start\` date NULL, \`season_end\` date NULL, \`points_formula\` json NULL, \`leg_rule\` json NULL, \`created_at\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`club_membership\` (\`id\` int NOT NULL AUTO_INCREMENT, \`club_id\` int NOT NULL, \`user_id\` int NOT NULL, \`role\` varchar(10) NOT NULL, \`exhibitor_name\` varchar(120) NULL, \`rabbitry_id\` int NULL, \`created_at\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_788eaada8d9a97b257aae2fba9\` (\`user_id\`), UNIQUE INDEX \`IDX_f9d1e8c5150f51ebc118746724\` (\`club_id\`, \`user_id\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`evaluation\` (\`id\` int NOT NULL AUTO_INCREMENT, \`animal_id\` int NOT NULL, \`evaluated_on\` date NOT NULL, \`evaluator\` varchar(120) NULL, \`scores\` json NOT NULL, \`notes\` text NULL, UNIQUE INDEX \`IDX_4fd42871f6d26816da2199070c\` (\`animal_id\`, \`evaluated_on\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`import_job\` (\`id\` int NOT NULL AUTO_INCREMENT, \`kind\` varchar(16) NOT NULL, \`scope_type\` varchar(8) NOT NULL, \`scope_id\` int NOT NULL, \`user_id\` int NOT NULL, \`file_name\` varchar(255) NOT NULL, \`status\` varchar(12) NOT NULL, \`total_rows\` int NOT NULL DEFAULT '0', \`processed_rows\` int NOT NULL DEFAULT '0', \`new_rows\` int NOT NULL DEFAULT '0', \`duplicate_rows\` int NOT NULL DEFAULT '0', \`error_rows\` int NOT NULL DEFAULT '0', \`mapping\` json NULL, \`error_report\` longtext NULL, \`message\` varchar(500) NULL, \`started_at\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), \`finished_at\` datetime NULL, INDEX \`IDX_fbc7e90a68dfede7d90fc589b6\` (\`scope_type\`, \`scope_id\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`invitation\` (\`id\` int NOT NULL AUTO_INCREMENT, \`email\` varchar(254) NOT NULL, \`token_hash\` char(64) NOT NULL, \`scope_type\` varchar(8) NOT NULL, \`scope_id\` int NOT NULL, \`role\` varchar(10) NOT NULL, \`invited_by\` int NOT NULL, \`created_at\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), \`expires_at\` datetime NOT NULL, \`accepted_at\` datetime NULL, \`revoked_at\` datetime NULL, INDEX \`IDX_bcb0a0d2333443083582a05cdd\` (\`email\`), UNIQUE INDEX \`IDX_b827d3749ffbb3b5ab5099afd6\` (\`token_hash\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`litter\` (\`id\` int NOT NULL AUTO_INCREMENT, \`rabbitry_id\` int NOT NULL, \`code\` varchar(40) NOT NULL, \`sire_id\` int NULL, \`dam_id\` int NULL, \`bred_on\` date NULL, \`kindled_on\` date NULL, \`born_alive\` smallint NULL, \`born_dead\` smallint NULL, \`weaned\` smallint NULL, \`weight_21d_grams\` int NULL, \`notes\` text NULL, INDEX \`IDX_82dddb6813a0bd425eb919c9f7\` (\`dam_id\`), UNIQUE INDEX \`IDX_86f823ff7079291c34888f2ef5\` (\`rabbitry_id\`, \`code\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`mentor_note\` (\`id\` int NOT NULL AUTO_INCREMENT, \`rabbitry_id\` int NOT NULL, \`animal_id\` int NULL, \`author_id\` int NOT NULL, \`body\` text NOT NULL, \`created_at\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_7ecfd4d753de0982a628eccdd3\` (\`rabbitry_id\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`password_reset\` (\`id\` int NOT NULL AUTO_INCREMENT, \`user_id\` int NOT NULL, \`token_hash\` char(64) NOT NULL, \`expires_at\` datetime NOT NULL, \`used_at\` datetime NULL, INDEX \`IDX_ad88301fdc79593dd222268a8b\` (\`user_id\`), UNIQUE INDEX \`IDX_0309de62e0cb0960ebb2cb65c9\` (\`token_hash\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`rabbitry\` (\`id\` int NOT NULL AUTO_INCREMENT, \`name\` varchar(120) NOT NULL, \`slug\` varchar(80) NOT NULL, \`location\` varchar(120) NULL, \`created_at\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), UNIQUE INDEX \`IDX_048fb0457edbc42eca50c34482\` (\`slug\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`rabbitry_membership\` (\`id\` int NOT NULL AUTO_INCREMENT, \`rabbitry_id\` int NOT NULL, \`user_id\` int NOT NULL, \`role\` varchar(10) NOT NULL, \`granted_by\` int NULL, \`created_at\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_705e4d24c40dd41d663042ce22\` (\`user_id\`), UNIQUE INDEX \`IDX_a41b11e177039399e5b0698b39\` (\`rabbitry_id\`, \`user_id\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`saved_mapping\` (\`id\` int NOT NULL AUTO_INCREMENT, \`user_id\` int NOT NULL, \`kind\` varchar(16) NOT NULL, \`mapping\` json NOT NULL, UNIQUE INDEX \`IDX_c9b4bd243c8c6823cfee205b93\` (\`user_id\`, \`kind\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`sessions\` (\`session_id\` varchar(128) NOT NULL, \`expires\` int UNSIGNED NOT NULL, \`data\` mediumtext NULL, PRIMARY KEY (\`session_id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`show\` (\`id\` int NOT NULL AUTO_INCREMENT, \`club_id\` int NOT NULL, \`name\` varchar(160) NOT NULL, \`show_date\` date NOT NULL, \`location\` varchar(160) NULL, \`host_club\` varchar(160) NULL, \`judges\` json NOT NULL, \`sanction_no\` varchar(40) NULL, UNIQUE INDEX \`IDX_c0df1205743c78d4258b036d51\` (\`club_id\`, \`name\`, \`show_date\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`show_result\` (\`id\` int NOT NULL AUTO_INCREMENT, \`show_id\` int NOT NULL, \`animal_id\` int NULL, \`ear_id\` varchar(32) NULL, \`exhibitor\` varchar(120) NOT NULL, \`breed\` varchar(80) NOT NULL, \`variety\` varchar(80) NULL, \`sex\` varchar(4) NOT NULL, \`age_class\` varchar(12) NOT NULL, \`entries_in_class\` smallint NOT NULL, \`exhibitors_in_class\` smallint NOT NULL, \`placing\` smallint NOT NULL, \`awards\` varchar(40) NOT NULL DEFAULT '', \`judge\` varchar(120) NULL, \`dedupe_key\` char(40) NOT NULL, \`import_job_id\` int NULL, INDEX \`IDX_97887447ce525dcc9426afeb44\` (\`animal_id\`), INDEX \`IDX_46b1ef259d24d2086422d6cd7b\` (\`exhibitor\`), UNIQUE INDEX \`IDX_d292ec6cb16c43b64201226490\` (\`show_id\`, \`dedupe_key\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`user\` (\`id\` int NOT NULL AUTO_INCREMENT, \`email\` varchar(254) NOT NULL, \`display_name\` varchar(120) NOT NULL, \`password_hash\` varchar(255) NOT NULL, \`is_admin\` tinyint NOT NULL DEFAULT 0, \`weight_unit\` varchar(8) NOT NULL DEFAULT 'lb-oz', \`date_order\` varchar(4) NOT NULL DEFAULT 'iso', \`created_at\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), UNIQUE INDEX \`IDX_e12875dfb3b1d92d7d7c5377e2\` (\`email\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`weight_record\` (\`id\` int NOT NULL AUTO_INCREMENT, \`animal_id\` int NOT NULL, \`weighed_on\` date NOT NULL, \`grams\` int NOT NULL, \`notes\` varchar(255) NULL, UNIQUE INDEX \`IDX_389a306150667bd872f099a376\` (\`animal_id\`, \`weighed_on\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX \`IDX_389a306150667bd872f099a376\` ON \`weight_record\``);
        await queryRunner.query(`DROP TABLE \`weight_record\``);
        await queryRunner.query(`DROP INDEX \`IDX_e12875dfb3b1d92d7d7c5377e2\` ON \`user\``);
        await queryRunner.query(`DROP TABLE \`user\``);
        await queryRunner.query(`DROP INDEX \`IDX_d292ec6cb16c43b64201226490\` ON \`show_result\``);
        await queryRunner.query(`DROP INDEX \`IDX_46b1ef259d24d2086422d6cd7b\` ON \`show_result\``);
        await queryRunner.query(`DROP INDEX \`IDX_97887447ce525dcc9426afeb44\` ON \`show_result\``);
        await queryRunner.query(`DROP TABLE \`show_result\``);
        await queryRunner.query(`DROP INDEX \`IDX_c0df1205743c78d4258b036d51\` ON \`show\``);
        await queryRunner.query(`DROP TABLE \`show\``);
        await queryRunner.query(`DROP TABLE \`sessions\``);
        await queryRunner.query(`DROP INDEX \`IDX_c9b4bd243c8c6823cfee205b93\` ON \`saved_mapping\``);
        await queryRunner.query(`DROP TABLE \`saved_mapping\``);
        await queryRunner.query(`DROP INDEX \`IDX_a41b11e177039399e5b0698b39\` ON \`rabbitry_membership\``);
        await queryRunner.query(`DROP INDEX \`IDX_705e4d24c40dd41d663042ce22\` ON \`rabbitry_membership\``);
        await queryRunner.query(`DROP TABLE \`rabbitry_membership\``);
        await queryRunner.query(`DROP INDEX \`IDX_048fb0457edbc42eca50c34482\` ON \`rabbitry\``);
        await queryRunner.query(`DROP TABLE \`rabbitry\``);
        await queryRunner.query(`DROP INDEX \`IDX_0309de62e0cb0960ebb2cb65c9\` ON \`password_reset\``);
        await queryRunner.query(`DROP INDEX \`IDX_ad88301fdc79593dd222268a8b\` ON \`password_reset\``);
        await queryRunner.query(`DROP TABLE \`password_reset\``);
        await queryRunner.query(`DROP INDEX \`IDX_7ecfd4d753de0982a628eccdd3\` ON \`mentor_note\``);
        await queryRunner.query(`DROP TABLE \`mentor_note\``);
        await queryRunner.query(`DROP INDEX \`IDX_86f823ff7079291c34888f2ef5\` ON \`litter\``);
        await queryRunner.query(`DROP INDEX \`IDX_82dddb6813a0bd425eb919c9f7\` ON \`litter\``);
        await queryRunner.query(`DROP TABLE \`litter\``);
        await queryRunner.query(`DROP INDEX \`IDX_b827d3749ffbb3b5ab5099afd6\` ON \`invitation\``);
        await queryRunner.query(`DROP INDEX \`IDX_bcb0a0d2333443083582a05cdd\` ON \`invitation\``);
        await queryRunner.query(`DROP TABLE \`invitation\``);
        await queryRunner.query(`DROP INDEX \`IDX_fbc7e90a68dfede7d90fc589b6\` ON \`import_job\``);
        await queryRunner.query(`DROP TABLE \`import_job\``);
        await queryRunner.query(`DROP INDEX \`IDX_4fd42871f6d26816da2199070c\` ON \`evaluation\``);
        await queryRunner.query(`DROP TABLE \`evaluation\``);
        await queryRunner.query(`DROP INDEX \`IDX_f9d1e8c5150f51ebc118746724\` ON \`club_membership\``);
        await queryRunner.query(`DROP INDEX \`IDX_788eaada8d9a97b257aae2fba9\` ON \`club_membership\``);
        await queryRunner.query(`DROP TABLE \`club_membership\``);
        await queryRunner.query(`DROP TABLE \`club\``);
        await queryRunner.query(`DROP INDEX \`IDX_114e1e2099cad7d73a7f011960\` ON \`breed\``);
        await queryRunner.query(`DROP TABLE \`breed\``);
        await queryRunner.query(`DROP INDEX \`IDX_794216b6ad80e3b1d60b6be5ae\` ON \`animal_status_change\``);
        await queryRunner.query(`DROP TABLE \`animal_status_change\``);
        await queryRunner.query(`DROP INDEX \`IDX_39769159b7fb4638b9a97578c4\` ON \`animal\``);
        await queryRunner.query(`DROP INDEX \`IDX_ef11a7f04ad2665a9586deadc2\` ON \`animal\``);
        await queryRunner.query(`DROP INDEX \`IDX_b6eb1a6ac1d293a31e5a529d98\` ON \`animal\``);
        await queryRunner.query(`DROP INDEX \`IDX_3edfe95e88e6d20c00de01a1d3\` ON \`animal\``);
        await queryRunner.query(`DROP TABLE \`animal\``);
    }

}

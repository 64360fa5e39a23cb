import { copyFile, mkdtemp, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import type { DataSource } from 'typeorm';
import type { ImportKindKey } from '@shared/imports/import-kinds';
import { hashPassword } from '../auth/passwords';
import { Breed } from '../db/entities/breed.entity';
import { Club } from '../db/entities/club.entity';
import { ClubMembership } from '../db/entities/club-membership.entity';
import { Rabbitry } from '../db/entities/rabbitry.entity';
import { RabbitryMembership } from '../db/entities/rabbitry-membership.entity';
import { User } from '../db/entities/user.entity';
import { ImportsService, type Scope } from '../imports/imports.service';

interface ImportSettings { dateOrder: 'iso' | 'mdy'; unitSetting: 'lb-oz' | 'kg' }
interface Scenario {
  club: { slug: string; name: string; region: string; seasonStart: string; seasonEnd: string; importSettings: ImportSettings; resultsFile: string };
  rabbitries: { slug: string; name: string; location: string; ownerEmail: string; importSettings: ImportSettings; files: string[] }[];
  accounts: {
    email: string; displayName: string; siteAdmin: boolean; unitSetting: 'lb-oz' | 'kg'; password: string;
    rabbitries: { slug: string; role: 'owner' | 'partner' | 'mentor' }[];
    clubs: { slug: string; role: 'officer' | 'member'; exhibitorName: string | null }[];
  }[];
}

/** The demo files, relative to the project root (the start and test commands run there; the API is bundled elsewhere). */
export const DEMO_DIR = resolve(process.env.KEEPERLINE_DEMO_DIR ?? 'sample-data/demo');
const KIND_ORDER: ImportKindKey[] = ['animals', 'litters', 'weights', 'evaluations'];

/**
 * Loads the invented demo season (sample-data/demo, written by sample-data/generate.ts):
 * accounts, breed catalogue, club and rabbitries directly, then every record file through the
 * real importer, as a breeder and a club secretary would. A second club with one officer shows
 * that another club's people see nothing of this one.
 */
export async function loadDemoSeason(db: DataSource, log: (msg: string) => void = () => {}): Promise<void> {
  const scenario: Scenario = JSON.parse(await readFile(join(DEMO_DIR, 'scenario.json'), 'utf8'));
  const breeds: { name: string; classScheme: 'four-class' | 'six-class'; varieties: string[]; weightLimits: unknown; evaluationTemplate: unknown; source?: string }[] =
    JSON.parse(await readFile(join(DEMO_DIR, 'breeds.json'), 'utf8'));
  const users = new Map<string, User>();
  const rabbitries = new Map<string, number>();
  let clubId = 0;
  await db.transaction(async (tx) => {
    await tx.getRepository(Breed).save(breeds.map((b) => ({
      name: b.name, classScheme: b.classScheme, varieties: b.varieties, weightLimits: b.weightLimits,
      evaluationTemplate: b.evaluationTemplate, sourceNote: b.source ?? 'from memory — check against the current official standard',
    })));
    const hashes = new Map<string, string>();
    for (const a of [...scenario.accounts, OTHER_CLUB_OFFICER]) {
      if (!hashes.has(a.password)) hashes.set(a.password, await hashPassword(a.password));
      users.set(a.email, await tx.getRepository(User).save({
        email: a.email, displayName: a.displayName, passwordHash: hashes.get(a.password)!, isAdmin: a.siteAdmin, weightUnit: a.unitSetting,
      }));
    }
    for (const r of scenario.rabbitries) {
      rabbitries.set(r.slug, (await tx.getRepository(Rabbitry).save({ name: r.name, slug: r.slug, location: r.location })).id);
    }
    const c = scenario.club;
    clubId = (await tx.getRepository(Club).save({ name: c.name, region: c.region, seasonStart: c.seasonStart, seasonEnd: c.seasonEnd })).id;
    const other = await tx.getRepository(Club).save({ name: OTHER_CLUB.name, region: OTHER_CLUB.region, seasonStart: c.seasonStart, seasonEnd: c.seasonEnd });
    for (const a of scenario.accounts) {
      const userId = users.get(a.email)!.id;
      for (const m of a.rabbitries) await tx.getRepository(RabbitryMembership).save({ rabbitryId: rabbitries.get(m.slug)!, userId, role: m.role });
      const herd = a.rabbitries.find((m) => m.role === 'owner');
      for (const m of a.clubs) {
        await tx.getRepository(ClubMembership).save({
          clubId, userId, role: m.role, exhibitorName: m.exhibitorName, rabbitryId: herd ? rabbitries.get(herd.slug)! : null,
        });
      }
    }
    await tx.getRepository(ClubMembership).save({ clubId: other.id, userId: users.get(OTHER_CLUB_OFFICER.email)!.id, role: 'officer', exhibitorName: OTHER_CLUB_OFFICER.displayName });
  });

  const imports = new ImportsService(db, join(tmpdir(), 'keeperline-demo'));
  const work = await mkdtemp(join(tmpdir(), 'keeperline-demo-'));
  try {
    for (const r of scenario.rabbitries) {
      const owner = users.get(r.ownerEmail)!;
      const files = [...r.files].sort((a, b) => KIND_ORDER.indexOf(kindOf(a)) - KIND_ORDER.indexOf(kindOf(b)));
      for (const file of files) {
        const msg = await importFile(imports, work, { type: 'rabbitry', id: rabbitries.get(r.slug)! }, owner.id, kindOf(file), file, r.importSettings);
        log(`${r.name}: ${file.split('/').pop()} — ${msg}`);
      }
    }
    const officer = scenario.accounts.find((a) => a.clubs.some((m) => m.role === 'officer'))!;
    const msg = await importFile(imports, work, { type: 'club', id: clubId }, users.get(officer.email)!.id, 'results', scenario.club.resultsFile, scenario.club.importSettings);
    log(`${scenario.club.name}: results — ${msg}`);
  } finally {
    await rm(work, { recursive: true, force: true });
  }
}

const kindOf = (file: string) => file.split('/').pop()!.replace('.csv', '') as ImportKindKey;

async function importFile(imports: ImportsService, work: string, scope: Scope, userId: number, kind: ImportKindKey, file: string, settings: ImportSettings): Promise<string> {
  const copy = join(work, file.replace(/\//g, '-'));
  await copyFile(join(DEMO_DIR, file), copy);
  const job = await imports.upload(scope, userId, kind, { path: copy, originalname: file.split('/').pop()! });
  await imports.startCheck(scope, job.id, userId, settings.unitSetting, { mapping: job.suggestedMapping, dateOrder: settings.dateOrder, unknownEarIds: 'skip' });
  const checked = await imports.waitFor(scope, job.id);
  if (checked.status !== 'checked') throw new Error(`demo file ${file}: ${checked.message}`);
  if (checked.summary!.errorRows > 0) throw new Error(`demo file ${file}: ${checked.summary!.errorRows} rows with errors, e.g. ${JSON.stringify(checked.summary!.problems[0])}`);
  await imports.startCommit(scope, job.id, userId, settings.unitSetting, false);
  const done = await imports.waitFor(scope, job.id);
  if (done.status !== 'done') throw new Error(`demo file ${file}: ${done.message}`);
  return done.message ?? '';
}

const OTHER_CLUB = { name: 'Lowmere Coast Fanciers', region: 'Lowmere Coast' };
const OTHER_CLUB_OFFICER = {
  email: 'other-club@example.test', displayName: 'Sunniva Ortolan', siteAdmin: false, unitSetting: 'kg' as const,
  password: 'keeperline-demo', rabbitries: [], clubs: [],
};

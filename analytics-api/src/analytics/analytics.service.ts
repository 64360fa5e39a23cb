import { createHash } from 'node:crypto';
import { gzipSync } from 'node:zlib';
import type { DataSource } from 'typeorm';
import type {
  BreedingValuesQuery, GrowthQuery, HeritabilityQuery, KeepersQuery, LinesQuery, PairingsQuery, PlacementQuery,
  RelationshipQuery, SeasonQuery, SeasonSettings, SeasonSettingsRequest,
} from '@shared/contracts/analytics';
import type { UnitSetting } from '@shared/units/weight';
import type { ResolvedAccess } from '../access/access-rules';
import { todayUtc } from '../animals/record-dates';
import { StampedCache, type StampedCacheOptions } from './analytics-cache';
import { describeScope, type HerdContext } from './analytics-context';
import { AnalyticsRepository } from './analytics.repository';
import { breedingValuesReport } from './breeding-values.service';
import { growthReport } from './growth.service';
import { buildHerdData, type HerdData } from './herd-data';
import { heritabilityReport } from './heritability.service';
import { inbreedingReport, pairingsReport, relationshipReport } from './inbreeding.service';
import { keepersReport } from './keepers.service';
import { linesReport } from './lines.service';
import { placementReport } from './placement.service';
import { buildClubData, type ClubData, seasonReport } from './season.service';

/**
 * A finished report as sent: the JSON bytes, the same gzipped, and an entity tag, all made once
 * per cache entry, so that a cached answer costs no serializing, hashing or compressing.
 */
export interface SerializedReport { body: Buffer; gzipped: Buffer; etag: string }

function serialize(report: unknown): SerializedReport {
  const body = Buffer.from(JSON.stringify(report));
  return { body, gzipped: gzipSync(body), etag: createHash('sha1').update(body).digest('base64url') };
}

/** What a report needs besides the herd itself. */
interface Needs {
  /** The report's estimate pools every rabbitry the caller may see. */
  pooled: boolean;
  /** The report also reads the pool of every visible rabbitry (growth references, heritability for BLUP). */
  visible: boolean;
}

/**
 * Analytics for herds and clubs. Gathers the records a caller may see (through the cache,
 * analytics-cache.ts), hands them to the report builders (which call the pure engine in
 * stats/), and answers with serialized JSON and its entity tag (a dashboard that asks again gets
 * 304 Not Modified while nothing changed).
 *
 * What is cached, per scope and data stamp (a change to any record of the scope drops it all):
 * - herd scopes (one rabbitry, or every rabbitry a caller may see): the loaded records, the
 *   sorted pedigree and every animal's F, the relationship table of a herd, trait values per
 *   trait, growth references per breed × sex, heritability estimates per trait, BLUP solutions
 *   per trait × h², the herd's show records with legs, and each finished report (keyed by its
 *   query, the day, and the stamps of every scope it read);
 * - club scopes: the season's shows and results, members and their animals' sires, and each
 *   season report per date range.
 */
export class AnalyticsService {
  private readonly repo: AnalyticsRepository;
  private readonly herds: StampedCache<HerdData>;
  private readonly clubs: StampedCache<ClubData>;

  constructor(db: DataSource, options: StampedCacheOptions = {}) {
    this.repo = new AnalyticsRepository(db);
    const ids = (key: string) => (key === '' ? [] : key.split(',').map(Number));
    this.herds = new StampedCache(
      (key) => this.repo.herdStamp(ids(key)),
      async (key) => buildHerdData(await this.repo.loadHerd(ids(key))),
      options,
    );
    this.clubs = new StampedCache(
      (key) => this.repo.clubStamp(Number(key)),
      async (key) => buildClubData(await this.repo.loadClub(Number(key))),
      { ...options, maxEntries: 8 },
    );
  }

  private async context(access: ResolvedAccess, needs: Needs): Promise<HerdContext> {
    const rabbitryId = access.rabbitryId!;
    const herd = await this.herds.get(String(rabbitryId));
    let visible = herd;
    if (needs.pooled || needs.visible) {
      const ids = (await this.repo.visibleRabbitries(access.userId, access.isAdmin)).map((r) => r.id);
      if (!ids.includes(rabbitryId)) ids.push(rabbitryId);
      ids.sort((a, b) => a - b);
      visible = await this.herds.get(ids.join(','));
    }
    const scope = needs.pooled ? visible : herd;
    return {
      rabbitryId,
      asOf: todayUtc(),
      herd,
      scope,
      visible,
      scopeInfo: describeScope(scope.data, needs.pooled),
      showRecords: () => herd.memo('showRecords', () => {
        const withResults = herd.data.animals.filter((a) => herd.data.resultsOf.has(a.id));
        return this.repo.showRecords(withResults.map((a) => ({
          id: a.id, birthDate: a.birthDate, classScheme: a.breedId === null ? null : (herd.data.breeds.get(a.breedId)?.classScheme ?? null),
        })));
      }),
    };
  }

  /** A report, computed and serialized once per query, day and data stamps. */
  private async respond(access: ResolvedAccess, report: string, query: unknown, needs: Needs, build: (ctx: HerdContext) => unknown): Promise<SerializedReport> {
    const ctx = await this.context(access, needs);
    const key = `report:${report}:${JSON.stringify(query)}:${ctx.asOf}:${ctx.visible.key}:${ctx.visible.stamp}`;
    return ctx.herd.memo(key, () => Promise.resolve().then(() => build(ctx)).then(serialize));
  }

  placement(access: ResolvedAccess, q: PlacementQuery) {
    return this.respond(access, 'placement', q, { pooled: false, visible: false }, (ctx) => placementReport(ctx, q));
  }

  heritability(access: ResolvedAccess, q: HeritabilityQuery) {
    return this.respond(access, 'heritability', q, { pooled: q.scope === 'all', visible: false }, (ctx) => heritabilityReport(ctx, q.trait));
  }

  growth(access: ResolvedAccess, q: GrowthQuery) {
    return this.respond(access, 'growth', q, { pooled: q.scope === 'all', visible: true }, (ctx) => growthReport(ctx, q));
  }

  inbreeding(access: ResolvedAccess) {
    return this.respond(access, 'inbreeding', {}, { pooled: false, visible: false }, (ctx) => inbreedingReport(ctx));
  }

  relationship(access: ResolvedAccess, q: RelationshipQuery) {
    return this.respond(access, 'relationship', q, { pooled: false, visible: false }, (ctx) => relationshipReport(ctx, q.a, q.b));
  }

  pairings(access: ResolvedAccess, q: PairingsQuery) {
    return this.respond(access, 'pairings', q, { pooled: false, visible: true }, (ctx) => pairingsReport(ctx, q));
  }

  breedingValues(access: ResolvedAccess, q: BreedingValuesQuery) {
    return this.respond(access, 'breeding-values', q, { pooled: q.scope === 'all', visible: true }, (ctx) => breedingValuesReport(ctx, q.trait, q.h2));
  }

  /** The explanations speak the reader's weight unit, so the unit is part of the report's key. */
  keepers(access: ResolvedAccess, q: KeepersQuery, unit: UnitSetting) {
    return this.respond(access, 'keepers', { ...q, unit }, { pooled: false, visible: true }, (ctx) => keepersReport(ctx, q, unit));
  }

  lines(access: ResolvedAccess, q: LinesQuery) {
    return this.respond(access, 'lines', q, { pooled: q.groupBy === 'rabbitry', visible: true }, (ctx) => linesReport(ctx, q));
  }

  async season(clubId: number, q: SeasonQuery): Promise<SerializedReport> {
    const entry = await this.clubs.get(String(clubId));
    const from = q.from ?? entry.data.rows.club.seasonStart;
    const to = q.to ?? entry.data.rows.club.seasonEnd;
    return entry.memo(`season:${from}:${to}`, () => serialize(seasonReport(entry.data, from, to)));
  }

  async saveSeason(clubId: number, s: SeasonSettingsRequest): Promise<SeasonSettings> {
    await this.repo.saveSeason(clubId, s);
    return { clubId, seasonStart: s.seasonStart, seasonEnd: s.seasonEnd, pointsFormula: s.pointsFormula };
  }
}

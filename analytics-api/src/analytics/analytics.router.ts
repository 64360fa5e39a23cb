import type { Request, Response } from 'express';
import {
  BreedingValuesQuery, GrowthQuery, HeritabilityQuery, KeepersQuery, LinesQuery, PairingsQuery, PlacementQuery,
  RelationshipQuery, SeasonQuery, SeasonSettingsRequest,
} from '@shared/contracts/analytics';
import { ANY_CLUB_ROLE, ANY_RABBITRY_ROLE, club } from '../access/access-rules';
import type { RouteRegistrar } from '../access/route-registrar';
import { validate } from '../http/validate';
import type { AnalyticsService, SerializedReport } from './analytics.service';

const herd = '/rabbitries/:rabbitryId/analytics';
/**
 * Reports come serialized (and gzipped) from the cache with their entity tag; an unchanged
 * report answers a conditional request with 304. They are private to the caller's roles:
 * never stored by shared caches.
 */
function sendReport(req: Request, res: Response, report: SerializedReport): void {
  const gzip = req.acceptsEncodings('gzip') === 'gzip';
  res.type('application/json').set({
    'Cache-Control': 'private, no-cache',
    Vary: 'Accept-Encoding',
    ETag: `"${report.etag}${gzip ? '-gz' : ''}"`,
  });
  if (req.fresh) {
    res.status(304).end();
    return;
  }
  if (gzip) res.set('Content-Encoding', 'gzip');
  res.send(gzip ? report.gzipped : report.body);
}

/** Analytics routes: herd reports for every rabbitry role, the season for every club role, season settings for officers. */
export function registerAnalyticsRoutes(r: RouteRegistrar, service: AnalyticsService): void {
  r.add('get', `${herd}/placement`, ANY_RABBITRY_ROLE, async (req, res) => {
    sendReport(req, res, await service.placement(res.locals.access, validate(PlacementQuery, req.query)));
  });
  r.add('get', `${herd}/heritability`, ANY_RABBITRY_ROLE, async (req, res) => {
    sendReport(req, res, await service.heritability(res.locals.access, validate(HeritabilityQuery, req.query)));
  });
  r.add('get', `${herd}/growth`, ANY_RABBITRY_ROLE, async (req, res) => {
    sendReport(req, res, await service.growth(res.locals.access, validate(GrowthQuery, req.query)));
  });
  r.add('get', `${herd}/inbreeding`, ANY_RABBITRY_ROLE, async (req, res) => {
    sendReport(req, res, await service.inbreeding(res.locals.access));
  });
  r.add('get', `${herd}/relationship`, ANY_RABBITRY_ROLE, async (req, res) => {
    sendReport(req, res, await service.relationship(res.locals.access, validate(RelationshipQuery, req.query)));
  });
  r.add('get', `${herd}/pairings`, ANY_RABBITRY_ROLE, async (req, res) => {
    sendReport(req, res, await service.pairings(res.locals.access, validate(PairingsQuery, req.query)));
  });
  r.add('get', `${herd}/breeding-values`, ANY_RABBITRY_ROLE, async (req, res) => {
    sendReport(req, res, await service.breedingValues(res.locals.access, validate(BreedingValuesQuery, req.query)));
  });
  r.add('get', `${herd}/keepers`, ANY_RABBITRY_ROLE, async (req, res) => {
    sendReport(req, res, await service.keepers(res.locals.access, validate(KeepersQuery, req.query), req.user!.weightUnit));
  });
  r.add('get', `${herd}/lines`, ANY_RABBITRY_ROLE, async (req, res) => {
    sendReport(req, res, await service.lines(res.locals.access, validate(LinesQuery, req.query)));
  });
  r.add('get', '/clubs/:clubId/analytics/season', ANY_CLUB_ROLE, async (req, res) => {
    sendReport(req, res, await service.season(res.locals.access.clubId!, validate(SeasonQuery, req.query)));
  });
  r.add('put', '/clubs/:clubId/season', club('officer'), async (req, res) => {
    res.json(await service.saveSeason(res.locals.access.clubId!, validate(SeasonSettingsRequest, req.body)));
  });
}

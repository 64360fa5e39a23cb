import type { Request } from 'express';
import { CreateShowRequest, DeleteShowQuery, SeasonResultsQuery, ShowResultsQuery, UpdateShowRequest } from '@shared/contracts/shows';
import { ANY_CLUB_ROLE, club } from '../access/access-rules';
import type { RouteRegistrar } from '../access/route-registrar';
import { idParam, validate } from '../http/validate';
import type { ShowsService } from './shows.service';

const OFFICER = club('officer');
const base = '/clubs/:clubId/shows';
const showId = (req: Request) => idParam(req.params.showId, 'Show');

/** A club's shows and their results: members read, officers manage (results come from imports). */
export function registerShowRoutes(r: RouteRegistrar, service: ShowsService): void {
  r.add('get', base, ANY_CLUB_ROLE, async (_req, res) => {
    res.json({ shows: await service.list(res.locals.access.clubId!) });
  });
  r.add('post', base, OFFICER, async (req, res) => {
    res.status(201).json(await service.create(res.locals.access.clubId!, validate(CreateShowRequest, req.body)));
  });
  r.add('get', `${base}/:showId`, ANY_CLUB_ROLE, async (req, res) => {
    res.json(await service.one(res.locals.access.clubId!, showId(req)));
  });
  r.add('patch', `${base}/:showId`, OFFICER, async (req, res) => {
    res.json(await service.update(res.locals.access.clubId!, showId(req), validate(UpdateShowRequest, req.body)));
  });
  r.add('delete', `${base}/:showId`, OFFICER, async (req, res) => {
    const { withResults } = validate(DeleteShowQuery, req.query);
    await service.remove(res.locals.access.clubId!, showId(req), withResults);
    res.status(204).end();
  });
  r.add('get', `${base}/:showId/results`, ANY_CLUB_ROLE, async (req, res) => {
    const { format } = validate(ShowResultsQuery, req.query);
    const clubId = res.locals.access.clubId!;
    if (format === 'csv') {
      const { fileName, csv } = await service.resultsCsv(clubId, showId(req));
      res.attachment(fileName).type('text/csv').send(csv);
      return;
    }
    res.json({ results: await service.results(clubId, showId(req)) });
  });
  r.add('delete', `${base}/:showId/results/:resultId`, OFFICER, async (req, res) => {
    await service.removeResult(res.locals.access.clubId!, showId(req), idParam(req.params.resultId, 'Result'));
    res.status(204).end();
  });
  r.add('get', '/clubs/:clubId/results', ANY_CLUB_ROLE, async (req, res) => {
    const q = validate(SeasonResultsQuery, req.query);
    const clubId = res.locals.access.clubId!;
    if (q.format === 'csv') {
      res.attachment('season-results.csv').type('text/csv').send(await service.seasonCsv(clubId, q));
      return;
    }
    res.json(await service.season(clubId, q));
  });
}

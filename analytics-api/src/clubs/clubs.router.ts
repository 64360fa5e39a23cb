import { AddClubMemberRequest } from '@shared/contracts/clubs';
import { ANY_CLUB_ROLE, club, SIGNED_IN } from '../access/access-rules';
import type { RouteRegistrar } from '../access/route-registrar';
import { idParam, validate } from '../http/validate';
import type { ClubsService } from './clubs.service';

export function registerClubRoutes(r: RouteRegistrar, service: ClubsService): void {
  r.add('get', '/clubs', SIGNED_IN, async (req, res) => {
    res.json({ clubs: await service.listForUser(req.user!.id) });
  });
  r.add('get', '/clubs/:clubId', ANY_CLUB_ROLE, async (_req, res) => {
    const a = res.locals.access;
    res.json(await service.read(a.clubId!, a.clubRole!));
  });
  r.add('get', '/clubs/:clubId/members', ANY_CLUB_ROLE, async (_req, res) => {
    res.json({ members: await service.members(res.locals.access.clubId!) });
  });
  r.add('post', '/clubs/:clubId/members', club('officer'), async (req, res) => {
    res.status(201).json(await service.addMember(res.locals.access.clubId!, validate(AddClubMemberRequest, req.body)));
  });
  r.add('delete', '/clubs/:clubId/members/:userId', club('officer'), async (req, res) => {
    await service.removeMember(res.locals.access.clubId!, idParam(req.params.userId, 'Member'), req.user!.id);
    res.status(204).end();
  });
}

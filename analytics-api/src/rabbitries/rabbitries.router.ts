import { CreateRabbitryRequest, GrantRabbitryAccessRequest, UpdateRabbitryRequest } from '@shared/contracts/rabbitries';
import { ANY_RABBITRY_ROLE, RABBITRY_EDITORS, rabbitry, SIGNED_IN } from '../access/access-rules';
import type { RouteRegistrar } from '../access/route-registrar';
import { idParam, validate } from '../http/validate';
import type { RabbitriesService } from './rabbitries.service';

export function registerRabbitryRoutes(r: RouteRegistrar, service: RabbitriesService): void {
  r.add('get', '/rabbitries', SIGNED_IN, async (req, res) => {
    res.json({ rabbitries: await service.listForUser(req.user!.id) });
  });
  r.add('post', '/rabbitries', SIGNED_IN, async (req, res) => {
    const input = validate(CreateRabbitryRequest, req.body);
    res.status(201).json(await service.create(req.user!.id, input));
  });
  r.add('get', '/rabbitries/:rabbitryId', ANY_RABBITRY_ROLE, async (_req, res) => {
    const a = res.locals.access;
    res.json(await service.read(a.rabbitryId!, a.rabbitryRole!));
  });
  r.add('patch', '/rabbitries/:rabbitryId', RABBITRY_EDITORS, async (req, res) => {
    const a = res.locals.access;
    res.json(await service.update(a.rabbitryId!, a.rabbitryRole!, validate(UpdateRabbitryRequest, req.body)));
  });
  r.add('delete', '/rabbitries/:rabbitryId', rabbitry('owner'), async (_req, res) => {
    await service.remove(res.locals.access.rabbitryId!);
    res.status(204).end();
  });
  r.add('get', '/rabbitries/:rabbitryId/members', ANY_RABBITRY_ROLE, async (_req, res) => {
    res.json({ members: await service.members(res.locals.access.rabbitryId!) });
  });
  r.add('post', '/rabbitries/:rabbitryId/members', rabbitry('owner'), async (req, res) => {
    const { email, role } = validate(GrantRabbitryAccessRequest, req.body);
    res.status(201).json(await service.grant(res.locals.access.rabbitryId!, req.user!.id, email, role));
  });
  r.add('delete', '/rabbitries/:rabbitryId/members/:userId', rabbitry('owner'), async (req, res) => {
    await service.revoke(res.locals.access.rabbitryId!, idParam(req.params.userId, 'Member'));
    res.status(204).end();
  });
}

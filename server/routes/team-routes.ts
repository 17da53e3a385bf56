import { changeRoleRequestSchema, inviteRequestSchema } from '../../shared/api';
import { admins, anyMember, requireTeam, requireUser } from '../http/access';
import { auditWho } from '../http/audit-who';
import { route, type RouteSpec } from '../http/route-table';
import { body } from '../http/validate';
import { changeRole, invite, removeMember, revokeInvitation, teamOverview, type TeamDeps } from '../services/team-service';

export function teamRoutes(d: TeamDeps): RouteSpec[] {
  return [
    route('get', '/team', anyMember, async (req, res) => {
      res.json(await teamOverview(d.ds, requireTeam(req)));
    }),
    route('post', '/team/invitations', admins, body(inviteRequestSchema), async (req, res) => {
      await invite(d, requireTeam(req), { ...auditWho(req), actorId: requireUser(req).id }, res.locals.body.email, res.locals.body.role);
      res.status(201).json(await teamOverview(d.ds, requireTeam(req)));
    }),
    route('delete', '/team/invitations/:id', admins, async (req, res) => {
      await revokeInvitation(d.ds, requireTeam(req), auditWho(req), req.params.id);
      res.status(204).end();
    }),
    route('put', '/team/members/:id/role', admins, body(changeRoleRequestSchema), async (req, res) => {
      await changeRole(d, requireTeam(req), auditWho(req), String(req.params.id), res.locals.body.role);
      res.json(await teamOverview(d.ds, requireTeam(req)));
    }),
    route('delete', '/team/members/:id', admins, async (req, res) => {
      await removeMember(d, requireTeam(req), auditWho(req), String(req.params.id));
      res.status(204).end();
    }),
  ];
}

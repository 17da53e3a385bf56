import type { RequestHandler } from 'express';
import type { DataSource } from 'typeorm';
import { Team } from '../db/entities';
import { NotFoundError } from './errors';

declare module 'express-serve-static-core' {
  interface Request {
    team?: Team;
  }
}

/**
 * Resolves the caller's team. Until sign-in exists every caller acts for the
 * configured demo team; with accounts this becomes the signed-in member's team
 * and nothing downstream changes, because services only ever see `req.team`.
 */
export function teamContext(ds: DataSource, teamSlug: string): RequestHandler {
  return (req, _res, next) => {
    ds.getRepository(Team)
      .findOneBy({ slug: teamSlug })
      .then((team) => {
        if (!team) throw new NotFoundError('team');
        req.team = team;
        next();
      })
      .catch(next);
  };
}

/** Who is acting, for provenance ("created by"). Until sign-in exists, a visitor of the demo team. */
export function actorName(_req: { team?: Team }): string {
  return 'demo visitor';
}

export function requireTeam(req: { team?: Team }): Team {
  if (!req.team) throw new NotFoundError('team');
  return req.team;
}

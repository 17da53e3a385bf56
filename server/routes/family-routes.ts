import type { Request } from 'express';
import type { DataSource } from 'typeorm';
import { createFamilyRequestSchema, duplicateFamilyRequestSchema, updateFamilyRequestSchema } from '../../shared/api';
import { fileOf, uploadThen } from '../http/upload';
import { actorName, designers, requireTeam } from '../http/access';
import { auditWho } from '../http/audit-who';
import { objectReaders } from '../http/object-access';
import { route, type RouteSpec } from '../http/route-table';
import { body, parseOrThrow } from '../http/validate';
import { exportFamily } from '../services/family-export';
import { createFamily, duplicateFamily, getFamily, listFamilies, setArchived, updateFamily } from '../services/family-service';
import { previewUpload, saveUpload } from '../services/family-upload-service';
import { z } from 'zod';

const uploadMeta = z.object({
  name: z.string({ error: 'name is required' }).trim().min(1, { error: 'name is required' }).max(120),
  source: z.string({ error: 'source is required' }).trim().min(1, { error: 'source is required: say where the numbers come from' }).max(2000),
  summary: z.string().trim().max(2000).default(''),
});

const versionQuery = z.object({ version: z.coerce.number({ error: 'version must be a whole number' }).int().min(1).optional() });

export function familyRoutes(ds: DataSource): RouteSpec[] {
  const team = (req: Request) => requireTeam(req);
  return [
    route('get', '/families', objectReaders.family, async (req, res) => {
      res.json(await listFamilies(ds, team(req), req.query.archived === '1'));
    }),
    route('post', '/families', designers, body(createFamilyRequestSchema), async (req, res) => {
      res.status(201).json({ family: await createFamily(ds, team(req), res.locals.body, actorName(req)) });
    }),
    route('post', '/families/upload/preview', designers, uploadThen(async (req) => previewUpload(fileOf(req)), 200)),
    route('post', '/families/upload', designers, uploadThen(async (req) => {
      const meta = parseOrThrow(uploadMeta, req.body ?? {});
      return saveUpload(ds, team(req), fileOf(req), meta, actorName(req));
    }, 201)),
    route('get', '/families/:id', objectReaders.family, async (req, res) => {
      res.json(await getFamily(ds, team(req), req.params.id));
    }),
    route('get', '/families/:id/versions/:version', objectReaders.family, async (req, res) => {
      const { version } = parseOrThrow(versionQuery, { version: req.params.version });
      res.json(await getFamily(ds, team(req), req.params.id, version));
    }),
    route('put', '/families/:id', designers, body(updateFamilyRequestSchema), async (req, res) => {
      res.json({ family: await updateFamily(ds, team(req), req.params.id, res.locals.body, actorName(req)) });
    }),
    route('post', '/families/:id/duplicate', designers, body(duplicateFamilyRequestSchema), async (req, res) => {
      res.status(201).json({ family: await duplicateFamily(ds, team(req), req.params.id, res.locals.body, actorName(req)) });
    }),
    route('post', '/families/:id/archive', designers, async (req, res) => {
      res.json({ family: await setArchived(ds, team(req), auditWho(req), req.params.id, true) });
    }),
    route('post', '/families/:id/unarchive', designers, async (req, res) => {
      res.json({ family: await setArchived(ds, team(req), auditWho(req), req.params.id, false) });
    }),
    ...(['csv', 'json'] as const).map((format) => route('get', `/families/:id/export.${format}`, objectReaders.family, async (req, res) => {
      const { version } = parseOrThrow(versionQuery, req.query);
      const out = await exportFamily(ds, team(req), req.params.id, format, version);
      res.type(format === 'csv' ? 'text/csv' : 'application/json').attachment(out.filename).send(out.body);
    })),
  ];
}

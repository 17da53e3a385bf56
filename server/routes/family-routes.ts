import type { Request, RequestHandler } from 'express';
import multer from 'multer';
import type { DataSource } from 'typeorm';
import { createFamilyRequestSchema, duplicateFamilyRequestSchema, maxUploadBytes, updateFamilyRequestSchema } from '../../shared/api';
import { HttpError, ValidationError } from '../http/errors';
import { actorName, anyMember, designers, requireTeam } from '../http/access';
import { route, type RouteSpec } from '../http/route-table';
import { body, parseOrThrow } from '../http/validate';
import { exportFamily } from '../services/family-export';
import { createFamily, duplicateFamily, getFamily, listFamilies, setArchived, updateFamily } from '../services/family-service';
import { previewUpload, saveUpload } from '../services/family-upload-service';
import { z } from 'zod';

/** Files stay in memory (≤ 5 MB); multer stops reading at the limit. */
const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxUploadBytes, files: 1, fields: 10, fieldSize: 10_000 } }).single('file');

const uploadMeta = z.object({
  name: z.string({ error: 'name is required' }).trim().min(1, { error: 'name is required' }).max(120),
  source: z.string({ error: 'source is required' }).trim().min(1, { error: 'source is required: say where the numbers come from' }).max(2000),
  summary: z.string().trim().max(2000).default(''),
});

const versionQuery = z.object({ version: z.coerce.number({ error: 'version must be a whole number' }).int().min(1).optional() });

function fileOf(req: Request): Buffer {
  if (!req.file) throw new ValidationError([{ field: 'file', message: 'attach the CSV file in the multipart field "file"' }]);
  if (req.file.size === 0) throw new ValidationError([{ field: 'file', message: 'the file is empty' }]);
  return req.file.buffer;
}

/** Refuses an announced oversized body before a byte of it is read. */
function tooLarge(req: Request): boolean {
  return Number(req.get('content-length') ?? 0) > maxUploadBytes + 64 * 1024;
}

function uploadThen(handle: (req: Request) => Promise<unknown>, status: number): RequestHandler {
  return (req, res, next) => {
    if (tooLarge(req)) return next(new HttpError(413, `The file is larger than ${maxUploadBytes / 1024 / 1024} MB.`, [{ field: 'file', message: 'too large' }], 'PayloadTooLarge'));
    upload(req, res, (err: unknown) => {
      if (err) return next(err);
      handle(req).then((out) => res.status(status).json(out), next);
    });
  };
}

export function familyRoutes(ds: DataSource): RouteSpec[] {
  const team = (req: Request) => requireTeam(req);
  return [

    route('get', '/families', anyMember, async (req, res) => {
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
    route('get', '/families/:id', anyMember, async (req, res) => {
      res.json(await getFamily(ds, team(req), req.params.id));
    }),
    route('get', '/families/:id/versions/:version', anyMember, async (req, res) => {
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
      res.json({ family: await setArchived(ds, team(req), req.params.id, true) });
    }),
    route('post', '/families/:id/unarchive', designers, async (req, res) => {
      res.json({ family: await setArchived(ds, team(req), req.params.id, false) });
    }),
    ...(['csv', 'json'] as const).map((format) => route('get', `/families/:id/export.${format}`, anyMember, async (req, res) => {
      const { version } = parseOrThrow(versionQuery, req.query);
      const out = await exportFamily(ds, team(req), req.params.id, format, version);
      res.type(format === 'csv' ? 'text/csv' : 'application/json').attachment(out.filename).send(out.body);
    })),
  ];
}

import type { Request, RequestHandler } from 'express';
import multer from 'multer';
import { maxUploadBytes } from '../../shared/api';
import { ThreadGate } from '../threads/thread-gate';
import { BusyError, HttpError, ValidationError } from './errors';

/** Files stay in memory (≤ 5 MB); multer stops reading at the limit. */
const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxUploadBytes, files: 1, fields: 10, fieldSize: 10_000 } }).single('file');

/** Refuses an announced oversized body before a byte of it is read. */
function tooLarge(req: Request): boolean {
  return Number(req.get('content-length') ?? 0) > maxUploadBytes + 64 * 1024;
}

export function fileOf(req: Request): Buffer {
  if (!req.file) throw new ValidationError([{ field: 'file', message: 'attach the CSV file in the multipart field "file"' }]);
  if (req.file.size === 0) throw new ValidationError([{ field: 'file', message: 'the file is empty' }]);
  return req.file.buffer;
}

/**
 * Uploads held in memory at once: each is up to 5 MB read before any thread
 * limit applies, so without a cap a crowd of uploads alone could fill the
 * API's memory (16 × 5 MB = 80 MB). No queue: a client over the cap is told
 * to come back.
 */
export const uploadGate = new ThreadGate(16, 0, 5);

/** Reads one multipart file, then answers with what `handle` returns. */
export function uploadThen(handle: (req: Request) => Promise<unknown>, status: number): RequestHandler {
  return (req, res, next) => {
    if (tooLarge(req)) {
      const found = `${(Number(req.get('content-length')) / 1024 / 1024).toFixed(1)} MB`;
      const limit = `${maxUploadBytes / 1024 / 1024} MB`;
      return next(new HttpError(413, `The upload is ${found}; files are limited to ${limit}.`, [{ field: 'file', message: `too large: ${found} sent, at most ${limit} accepted` }], 'PayloadTooLarge'));
    }
    uploadGate.enter().then(
      (leave) => {
        // Finished or abandoned, the answer frees the place (and the file with it).
        res.once('close', leave);
        upload(req, res, (err: unknown) => {
          if (err) return next(err);
          handle(req).then((out) => res.status(status).json(out), next);
        });
      },
      () => next(new BusyError(`The server is receiving too many uploads at once; try again in ${uploadGate.retryAfterSeconds} seconds.`, uploadGate.retryAfterSeconds)),
    );
  };
}

import express, { type Express, type Response } from 'express';
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, statSync } from 'node:fs';
import { join, relative, sep } from 'node:path';

/**
 * Files whose name carries a hash of their content: the export's bundles
 * (`_expo/static/js/web/app-entry-<md5>.js`, a route's `index-<md5>.js`) and Metro's assets
 * (`assets/…/IBMPlexSans_400Regular.<md5>.ttf`, `icon.<md5>@2x.png`). A new
 * build gives them new names, so a browser may keep them for good.
 */
const contentHashed = /^(_expo\/static\/.+-[0-9a-f]{32}|assets\/.+\.[0-9a-f]{32}(@\d+(\.\d+)?x)?)\.[a-z0-9]+$/;

export const cachePolicy = {
  hashed: 'public, max-age=31536000, immutable',
  /** HTML and unhashed files (canvaskit.wasm): kept, but revalidated (ETag, 304) before every use. */
  revalidate: 'no-cache',
} as const;

export function cacheControlFor(pathInDist: string): string {
  return contentHashed.test(pathInDist.split(sep).join('/')) ? cachePolicy.hashed : cachePolicy.revalidate;
}

/** Something derived from the export, recomputed only when a new export rewrites index.html. */
function perExport<T>(indexHtml: string, none: T, derive: () => T): () => T {
  let seen = { mtimeMs: -1, value: none };
  return () => {
    if (!existsSync(indexHtml)) return none;
    const { mtimeMs } = statSync(indexHtml);
    if (mtimeMs !== seen.mtimeMs) seen = { mtimeMs, value: derive() };
    return seen.value;
  };
}

const sha256 = (text: string): string => `'sha256-${createHash('sha256').update(text, 'utf8').digest('base64')}'`;

/**
 * CSP hashes (`'sha256-…'`) of index.html's inline scripts, so the policy
 * allows exactly those and no other; re-read only when the file changes.
 * Today's single-page export has none (its scripts are files), static
 * rendering would add some.
 */
export function inlineScriptHashes(indexHtml: string): () => string[] {
  return perExport(indexHtml, [], () =>
    [...readFileSync(indexHtml, 'utf8').matchAll(/<script(\s[^>]*)?>([\s\S]*?)<\/script>/gi)]
      .filter((m) => !/\ssrc=/i.test(m[1] ?? '') && m[2]!.length > 0)
      .map((m) => sha256(m[2]!)));
}

/**
 * The exported web build at the same origin as the API, so cookies just work.
 * Every path that is not a file answers index.html (the client routes); a
 * missing bundle or asset answers 404 rather than HTML a browser would refuse.
 */
export function serveWeb(app: Express, dist: string): void {
  const index = join(dist, 'index.html');
  const sendIndex = (res: Response) => {
    res.set('Cache-Control', cachePolicy.revalidate);
    if (existsSync(index)) res.sendFile(index);
    else res.status(503).type('text').send('The web build is missing: run `npm start` (it exports the app) or `npx expo export --platform web`.');
  };
  app.use(express.static(dist, {
    index: false,
    cacheControl: false,
    setHeaders: (res, file) => res.set('Cache-Control', cacheControlFor(relative(dist, file))),
  }));
  app.use(['/_expo', '/assets'], (_req, res) => {
    res.status(404).type('text').send('Not in this build.');
  });
  app.get('/{*path}', (_req, res) => sendIndex(res));
}

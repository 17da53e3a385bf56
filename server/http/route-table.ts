import { Router, type RequestHandler } from 'express';
import type { DataSource } from 'typeorm';
import { authorize, type Access } from './access';

export type Method = 'get' | 'post' | 'put' | 'delete';

/**
 * One API route and who may call it. Every route is declared through this
 * table: the access matrix test walks it, and a route mounted any other way
 * fails that test.
 */
export type RouteSpec = { method: Method; path: string; access: Access; handlers: RequestHandler[] };

export const route = (method: Method, path: string, access: Access, ...handlers: RequestHandler[]): RouteSpec => ({ method, path, access, handlers });

export function mountRoutes(ds: DataSource, specs: RouteSpec[]): Router {
  const r = Router();
  for (const s of specs) r[s.method](s.path, authorize(ds, s.access), ...s.handlers);
  return r;
}

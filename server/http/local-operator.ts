import type { Request } from 'express';

/** Headers a reverse proxy adds; any one of them means the caller is not on this machine. */
const proxyHeaders = ['x-forwarded-for', 'forwarded', 'x-real-ip', 'x-forwarded-host', 'x-forwarded-proto', 'via'];

const loopback = (address: string): boolean => address === '::1' || /^(::ffff:)?127\./.test(address);

/**
 * The person running this installation: a request from loopback with no
 * proxy in front (`npm start` and `npm test` wait for health this way). The
 * socket's own address, not `req.ip`, which a proxy's header may set. A
 * reverse proxy on the same machine must say it forwards (X-Forwarded-For,
 * as it must for per-address sign-in limits anyway), or its callers count
 * as the operator.
 */
export function isLocalOperator(req: Request): boolean {
  return loopback(req.socket.remoteAddress ?? '') && proxyHeaders.every((h) => req.get(h) === undefined);
}

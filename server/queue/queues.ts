/** Queue names shared by the API (which sends) and the workers (which work). */
export const queues = {
  /** A no-op job used by the health check and tests to prove the queue → worker path. */
  probe: 'system-probe',
  /** Computes a growth order's sheet (zoning for every K, tolerances) in a worker. */
  growthSheet: 'growth-sheet',
  /** Account mail (sign-up and invitation links, resets, notices to owners): sent by a worker, never inside a request. */
  accountMail: 'account-mail',
  /** Mail about growth orders (the verdict and its reason to the growers): sent by a worker, never inside a request. */
  growthMail: 'growth-mail',
} as const;

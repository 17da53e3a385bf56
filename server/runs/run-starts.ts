/**
 * The search starts a run was launched with, frozen with it: in its design
 * snapshot (leg runs; runs from before starts were a setting made one) or in
 * its cooler's input (couple and cascade runs). The API and the worker read it alike.
 */
export function frozenStarts(kind: string, designSnapshot: Record<string, unknown> | null, coolerSnapshot: Record<string, unknown> | null): number {
  const raw = kind === 'leg' ? designSnapshot?.starts : (coolerSnapshot?.input as { starts?: unknown } | undefined)?.starts;
  const n = Number(raw ?? 1);
  return Number.isInteger(n) && n >= 1 ? n : 1;
}

/**
 * Gauss–Legendre nodes and weights on [−1, 1], computed once by Newton's
 * method on the Legendre polynomial (the classical Golub–Welsch-free
 * recipe). Used only to build and check the Fermi-integral tables, never in
 * the solver's inner loop.
 */
export type GaussRule = { nodes: Float64Array; weights: Float64Array };

const cache = new Map<number, GaussRule>();

export function gaussLegendre(n: number): GaussRule {
  const hit = cache.get(n);
  if (hit) return hit;
  const nodes = new Float64Array(n);
  const weights = new Float64Array(n);
  for (let i = 0; i < Math.ceil(n / 2); i++) {
    // Tricomi's initial guess, then Newton on P_n.
    let x = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 0;
    for (let iter = 0; iter < 100; iter++) {
      let p0 = 1;
      let p1 = x;
      for (let k = 2; k <= n; k++) {
        const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      dp = (n * (x * p1 - p0)) / (x * x - 1);
      const dx = p1 / dp;
      x -= dx;
      if (Math.abs(dx) < 1e-16) break;
    }
    // Recompute P_n' at the converged node for the weight.
    let p0 = 1;
    let p1 = x;
    for (let k = 2; k <= n; k++) {
      const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
      p0 = p1;
      p1 = p2;
    }
    dp = (n * (x * p1 - p0)) / (x * x - 1);
    const w = 2 / ((1 - x * x) * dp * dp);
    nodes[i] = -x;
    nodes[n - 1 - i] = x;
    weights[i] = w;
    weights[n - 1 - i] = w;
  }
  const rule = { nodes, weights };
  cache.set(n, rule);
  return rule;
}

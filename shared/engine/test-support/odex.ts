/**
 * The independent reference integrator for the tests: odex, a port of Hairer
 * and Wanner's Gragg–Bulirsch–Stoer extrapolation code ODEX.
 *
 * Why jest.requireActual rather than an import: the package ships its
 * TypeScript source beside the JavaScript, and a static import would make
 * our strict type-check compile that source too (it does not pass strict
 * mode). We type only the part the tests use.
 */
export type OdexResult = { y: number[]; outcome: number; nStep: number; nEval: number };

export type OdexSolver = {
  absoluteTolerance: number;
  relativeTolerance: number;
  maxSteps: number;
  solve(f: (x: number, y: number[]) => number[], x0: number, y0: number[], x1: number): OdexResult;
};

type OdexModule = { Solver: new (n: number) => OdexSolver };

export function odexSolver(dimension: number, tolerance: number): OdexSolver {
  const { Solver } = jest.requireActual<OdexModule>('odex');
  const solver = new Solver(dimension);
  solver.absoluteTolerance = tolerance;
  solver.relativeTolerance = tolerance;
  solver.maxSteps = 100000;
  return solver;
}

import { parseCase, solveLeg } from '@/shared/engine';
import { designToCase } from '@/shared/runs/design-case';
import { design, pBand } from '../runs/test-fixtures';
import { emptyDesignValues, validateDesign, type ValidDesign } from './design-form-model';
import { quickEstimate } from './quick-estimate-model';

function input(overrides: Partial<ValidDesign> = {}): ValidDesign {
  const checked = validateDesign({ ...emptyDesignValues(design().familyId), name: 'Estimate' });
  if (!checked.ok) throw new Error('the default design should be valid');
  return { ...checked.input, ...overrides };
}

/** ΔT of the uniform leg at doping n and current I, solved directly. */
function uniformDeltaT(d: ValidDesign, perCm3: number, current: number): number {
  const { objective: _o, bounds: _b, controlPoints: _c, monotone: _m, ...leg } = designToCase({ ...d, coldSide: null }, pBand);
  return solveLeg(parseCase({ ...leg, doping: perCm3, current }, 'solve')).deltaT;
}

describe('quickEstimate', () => {
  const d = input();
  const outcome = quickEstimate(d, pBand);
  if (!outcome.ok) throw new Error(outcome.message);
  const { uniform, twoNode } = outcome.estimate;

  it('reports a uniform leg that the direct solver confirms', () => {
    expect(uniform.perCm3).not.toBeNull();
    expect(uniformDeltaT(d, uniform.perCm3!, uniform.current)).toBeCloseTo(uniform.deltaT, 6);
  });

  it('finds the best uniform leg: nearby dopings and currents cool less', () => {
    for (const factor of [0.9, 1.1]) {
      expect(uniformDeltaT(d, uniform.perCm3! * factor, uniform.current)).toBeLessThan(uniform.deltaT);
      expect(uniformDeltaT(d, uniform.perCm3!, uniform.current * factor)).toBeLessThan(uniform.deltaT);
    }
  });

  it('grading two nodes never cools less than the best uniform leg (uniform is one of its profiles)', () => {
    expect(twoNode.deltaT).toBeGreaterThanOrEqual(uniform.deltaT - 1e-6);
  });

  it('scales with the leg as the 1-D model says: ΔT at no load does not depend on L, the best current goes as A/L', () => {
    // With x → 2x the equations keep their form when J·L is kept: the same T(x/L) at half the current.
    const longer = quickEstimate(input({ lengthMm: 2 * d.lengthMm }), pBand);
    if (!longer.ok) throw new Error(longer.message);
    expect(longer.estimate.uniform.deltaT).toBeCloseTo(uniform.deltaT, 4);
    expect(longer.estimate.uniform.current).toBeCloseTo(uniform.current / 2, 3);
  });

  it('names the field the engine refuses', () => {
    const refused = quickEstimate(input(), { kind: 'table', rows: [{ perCm3: 1e19, temperature: 300, seebeck: 2e-4, sigma: 1e5, kappa: 1.5 }] });
    expect(refused.ok).toBe(false);
    if (!refused.ok) expect(refused.field).toMatch(/^material/);
  });
});

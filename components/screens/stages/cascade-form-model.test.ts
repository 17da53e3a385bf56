import { cascadeInputSchema } from '@/shared/api/coolers';
import { cascadeInputFrom, cascadeTextFrom, defaultCascadeText, maxStages, withStageAdded, withStageRemoved, type CascadeText } from './cascade-form-model';
import { coupleInputFrom, defaultCoupleText } from './couple-form-model';

const pFamily = '11111111-1111-4111-8111-111111111111';
const nFamily = '55555555-5555-4555-8555-555555555555';

function filled(): CascadeText {
  const t = defaultCascadeText();
  const legs = { p: { ...t.stages[0]!.p, familyId: pFamily }, n: { ...t.stages[0]!.n, familyId: nFamily } };
  return { ...t, name: 'Two stages', stages: t.stages.map((s) => ({ ...s, ...legs })) };
}

describe('cascadeInputFrom', () => {
  it('builds an input the API schema accepts, the load typed in mW sent in W', () => {
    const { input, errors } = cascadeInputFrom({ ...filled(), heatLoadMw: '5' });
    expect(errors).toEqual({});
    expect(input?.heatLoad).toBeCloseTo(0.005, 12);
    expect(input?.stages.map((s) => s.couples)).toEqual([8, 32]);
    expect(cascadeInputSchema.safeParse(input).success).toBe(true);
  });

  it('puts each message under its stage field, in words with the unit', () => {
    const t = filled();
    const { input, errors } = cascadeInputFrom({ ...t, stages: [{ ...t.stages[0]!, couples: 'many' }, { ...t.stages[1]!, p: { ...t.stages[1]!.p, familyId: '' } }] });
    expect(input).toBeNull();
    expect(errors['stages.0.couples']).toBe('Stage 1: couples must be a number');
    expect(errors['stages.1.source.p.familyId']).toBe('Stage 2, p-type leg: pick a family');
  });

  it('refuses what the contract refuses, worded through the field labels (a stage without couples, a cold side above the sink)', () => {
    const t = filled();
    const zero = cascadeInputFrom({ ...t, stages: [{ ...t.stages[0]!, couples: '0' }, t.stages[1]!] });
    expect(zero.errors['stages.0.couples']).toMatch(/at least 1: a stage without couples cannot pump heat/);
    const above = cascadeInputFrom({ ...t, objective: 'minPower', coldSide: '310' });
    expect(above.errors.coldSide).toMatch(/must be below Hot-side temperature Th/);
    const missing = cascadeInputFrom({ ...t, objective: 'minPower', coldSide: '' });
    expect(missing.errors.coldSide).toMatch(/Cold-side target Tc \(K\) is required/);
    const total = cascadeInputFrom({ ...t, countsOptimised: true, totalCouples: '1' });
    expect(total.errors['couplesLimit.total']).toBeDefined();
  });

  it('adds stages at the hot end with three times the couples, at most four, and removes any but the last one', () => {
    let t = filled();
    t = withStageAdded(t);
    expect(t.stages.map((s) => s.couples)).toEqual(['8', '32', '96']);
    t = withStageAdded(withStageAdded(t));
    expect(t.stages).toHaveLength(maxStages);
    t = withStageRemoved(t, 0);
    expect(t.stages.map((s) => s.couples)).toEqual(['32', '96', '288']);
    expect(withStageRemoved({ ...t, stages: [t.stages[0]!] }, 0).stages).toHaveLength(1);
  });

  it('reads a saved input back into the same text', () => {
    const { input } = cascadeInputFrom({ ...filled(), countsOptimised: true, totalCouples: '60' });
    if (!input) throw new Error('no input');
    const back = cascadeTextFrom(input);
    expect(back.heatLoadMw).toBe('5');
    expect(back.countsOptimised).toBe(true);
    expect(back.totalCouples).toBe('60');
    expect(cascadeInputFrom(back).input).toEqual(input);
  });
});

describe('coupleInputFrom', () => {
  it('asks for a leg design on each side and leaves the area ratio to the optimiser by default', () => {
    const empty = coupleInputFrom({ ...defaultCoupleText(), name: 'Matched' });
    expect(empty.errors['p.designId']).toBe('p-type leg: pick a leg design');
    const t = defaultCoupleText();
    const { input, errors } = coupleInputFrom({ ...t, name: 'Matched', p: { ...t.p, designId: '22222222-2222-4222-8222-222222222222' }, n: { ...t.n, kind: 'family', familyId: nFamily } });
    expect(errors).toEqual({});
    expect(input).not.toHaveProperty('areaRatio');
    expect(input?.p).toEqual({ kind: 'design', designId: '22222222-2222-4222-8222-222222222222' });
  });

  it('needs a cold side for the heat-load objective and a positive fixed ratio', () => {
    const t = { ...defaultCoupleText(), name: 'M', p: { ...defaultCoupleText().p, designId: '22222222-2222-4222-8222-222222222222' }, n: { ...defaultCoupleText().n, designId: '22222222-2222-4222-8222-222222222223' } };
    expect(coupleInputFrom({ ...t, objective: 'maxHeatLoad', coldSide: '' }).errors.coldSide).toMatch(/required/);
    expect(coupleInputFrom({ ...t, areaRatioFree: false, areaRatio: '0' }).errors.areaRatio).toMatch(/Area ratio A_n \/ A_p must be greater than 0/);
  });
});

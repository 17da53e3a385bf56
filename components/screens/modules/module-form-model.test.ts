import { defaultModuleText, moduleInputFrom, textFrom } from './module-form-model';

describe('moduleInputFrom', () => {
  it('names each missing or malformed field with its unit', () => {
    const t = defaultModuleText('run-1');
    const { input, errors } = moduleInputFrom({ ...t, name: ' ', deltaT: 'abc', currentLimit: 'x' });
    expect(input).toBeNull();
    expect(errors.name).toMatch(/Name is required/);
    expect(errors.deltaT).toMatch(/ΔT \(K\) must be a number/);
    expect(errors.currentLimit).toMatch(/Current limit \(A\)/);
    expect(errors['n.familyId']).toMatch(/n-type leg: pick a family/);
  });

  it('builds the API input, leaving empty optional fields out, and reads back', () => {
    const t = defaultModuleText('run-1');
    const { input, errors } = moduleInputFrom({ ...t, name: 'Couple A', n: { ...t.n, familyId: 'fam-n' }, currentLimit: '5' });
    expect(errors).toEqual({});
    expect(input).toEqual({
      name: 'Couple A',
      p: { kind: 'run', runId: 'run-1', leg: 'optimum' },
      n: { kind: 'family', familyId: 'fam-n', perCm3: 2e19, lengthMm: 1.5, areaMm2: 1 },
      hotSide: 300,
      deltaT: 30,
      couples: 31,
      currentLimit: 5,
    });
    if (!input) throw new Error('no input');
    expect(textFrom(input).currentLimit).toBe('5');
    expect(textFrom(input).areaRatio).toBe('');
  });
});

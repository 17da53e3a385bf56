import { bandDetail } from '../test-fixtures';
import { emptyBandValues, humanize, splitApiErrors, validate, valuesFromVersion, type FamilyFormValues } from './family-form-model';

function filled(overrides: Partial<FamilyFormValues['numbers']> = {}): FamilyFormValues {
  return {
    ...emptyBandValues(),
    name: '  Ingot 9 fit ',
    source: 'Hall and Seebeck on 6 bars, ingot 9',
    numbers: {
      effectiveMass: '1.1',
      mobility300: '320',
      mobilityExponent: '−1.5',
      latticeKappa300: '1,2',
      latticeKappaExponent: '-1',
      ...overrides,
    },
  };
}

describe('band family form model', () => {
  it('turns typed text into the request the API takes', () => {
    const result = validate(filled());
    expect(result).toEqual({
      ok: true,
      request: {
        name: 'Ingot 9 fit',
        summary: '',
        source: 'Hall and Seebeck on 6 bars, ingot 9',
        definition: {
          kind: 'band',
          carrier: 'p',
          effectiveMass: 1.1,
          mobility300: 320,
          mobilityExponent: -1.5,
          latticeKappa300: 1.2,
          latticeKappaExponent: -1,
        },
      },
    });
  });

  it('names each missing or bad field by its label, as the server schema would', () => {
    const result = validate({ ...filled({ effectiveMass: '', mobility300: 'fast', latticeKappa300: '-2' }), name: ' ', source: '' });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors).toEqual({
      name: 'Name is required',
      source: 'Source is required: say where the numbers come from',
      'definition.effectiveMass': 'Effective mass is required',
      'definition.mobility300': 'Mobility at 300 K must be a finite number',
      'definition.latticeKappa300': 'Lattice thermal conductivity at 300 K must be greater than 0',
    });
  });

  it('catches a unit slip with the schema’s hint', () => {
    const result = validate(filled({ mobility300: '3.2e6' }));
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors['definition.mobility300']).toMatch(/^Mobility at 300 K above 1000000 is implausible: the mobility is in cm²\/\(V·s\)/);
  });

  it('keeps a measured definition as it is and checks only the texts', () => {
    const definition = { kind: 'constant', seebeck: 2e-4, sigma: 1e5, kappa: 1.5 } as const;
    const result = validate({ ...emptyBandValues(), name: 'Reference', source: 'Round numbers' }, definition);
    expect(result).toEqual({ ok: true, request: { name: 'Reference', summary: '', source: 'Round numbers', definition } });
  });

  it('fills the form from a stored band version', () => {
    const values = valuesFromVersion('Graded p-leg model', bandDetail().current);
    expect(values.carrier).toBe('p');
    expect(values.numbers).toEqual({
      effectiveMass: '1.2',
      mobility300: '280',
      mobilityExponent: '-1.5',
      latticeKappa300: '0.9',
      latticeKappaExponent: '-1',
    });
    expect(values.source).toBe('Fit to ingot 7, revision 3');
  });

  it('sorts API field errors into form fields and the rest', () => {
    const split = splitApiErrors([
      { field: 'definition.effectiveMass', message: 'effectiveMass must be greater than 0' },
      { field: 'name', message: 'a family with this name exists already' },
      { field: 'definition', message: 'unknown key "colour"' },
    ]);
    expect(split.byField).toEqual({
      'definition.effectiveMass': 'Effective mass must be greater than 0',
      name: 'a family with this name exists already',
    });
    expect(split.other).toEqual(['Material definition: unknown key "colour"']);
    expect(humanize('definition.mobilityExponent', 'mobilityExponent is required')).toBe('Mobility exponent is required');
  });

  it('adds the minority band when two bands are chosen, and names its fields by their labels', () => {
    const two = { ...filled(), twoBands: true, minority: { bandGap: '0.2', bandGapSlope: '1e-4', effectiveMass: '1', mobility300: '600', mobilityExponent: '-1.5' } };
    const result = validate(two);
    expect(result.ok && result.request.definition).toEqual(expect.objectContaining({ minority: { bandGap: 0.2, bandGapSlope: 1e-4, effectiveMass: 1, mobility300: 600, mobilityExponent: -1.5 } }));
    // One band: whatever was typed in the hidden minority fields is not sent.
    const one = validate({ ...two, twoBands: false });
    expect(one.ok && 'minority' in one.request.definition).toBe(false);
    const bad = validate({ ...two, minority: { ...two.minority, bandGap: '170', mobility300: '' } });
    expect(bad.ok).toBe(false);
    if (bad.ok) return;
    expect(bad.errors['definition.minority.bandGap']).toMatch(/^Band gap at 0 K above 10 is implausible: .*eV.*meV/);
    expect(bad.errors['definition.minority.mobility300']).toBe('Minority mobility at 300 K is required');
    const closing = validate({ ...two, minority: { ...two.minority, bandGap: '0.02' } });
    expect(!closing.ok && closing.errors['definition.minority.bandGapSlope']).toMatch(/closes below 300 K/);
  });

  it('fills the minority fields from a stored two-band version, and leaves them at their defaults for one band', () => {
    const stored = bandDetail().current;
    const definition = { ...(stored.definition as Extract<typeof stored.definition, { kind: 'band' }>), minority: { bandGap: 0.22, bandGapSlope: 1e-4, effectiveMass: 1, mobility300: 200, mobilityExponent: -1.5 } };
    const values = valuesFromVersion('Two-band', { ...stored, definition });
    expect(values.twoBands).toBe(true);
    expect(values.minority).toEqual({ bandGap: '0.22', bandGapSlope: '0.0001', effectiveMass: '1', mobility300: '200', mobilityExponent: '-1.5' });
    expect(valuesFromVersion('One band', stored).twoBands).toBe(false);
  });
});

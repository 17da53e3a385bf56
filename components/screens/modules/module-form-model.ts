import type { z } from 'zod';
import type { CoupleLegSource, coupleLegSourceSchema } from '@/shared/api/coolers';
import type { ModuleInput } from '@/shared/api/modules';
import { formatForInput } from '@/components/format/number';

/** A leg as the forms hold it; `design` (a leg design optimised within its family) only where a matched couple is built. */
export type LegText = { kind: 'run' | 'family' | 'design'; runId: string; leg: 'optimum' | 'uniform' | 'localBestZt'; familyId: string; perCm3: string; lengthMm: string; areaMm2: string; designId: string };

export type ModuleText = {
  name: string;
  p: LegText;
  n: LegText;
  hotSide: string;
  deltaT: string;
  couples: string;
  areaRatio: string;
  contactResistivity: string;
  coldPlateResistance: string;
  hotPlateResistance: string;
  currentLimit: string;
};

export const emptyLeg = (kind: LegText['kind'], runId = ''): LegText => ({ kind, runId, leg: 'optimum', familyId: '', perCm3: '2e19', lengthMm: '1.5', areaMm2: '1', designId: '' });

export const defaultModuleText = (pRunId = ''): ModuleText => ({
  name: '',
  p: emptyLeg(pRunId ? 'run' : 'family', pRunId),
  n: emptyLeg('family'),
  hotSide: '300',
  deltaT: '30',
  couples: '31',
  areaRatio: '',
  contactResistivity: '',
  coldPlateResistance: '',
  hotPlateResistance: '',
  currentLimit: '',
});

export type FieldErrors = Record<string, string>;

/** A number typed into `field`: a message naming it (and its unit) when it is missing or not a number. */
export function numberFromText(errors: FieldErrors, field: string, text: string, what: string, optional = false): number | undefined {
  if (text.trim() === '') {
    if (!optional) errors[field] = `${what} is required`;
    return undefined;
  }
  const v = Number(text);
  if (!Number.isFinite(v)) errors[field] = `${what} must be a number`;
  return v;
}

/**
 * One leg's text as a leg source; `path` is where its fields sit in the
 * payload ("p", "stages.0.source.n"), so a message lands beside its field.
 */
export function legSourceFromText(errors: FieldErrors, path: string, side: 'p' | 'n', l: LegText): CoupleLegSource | null {
  if (l.kind === 'design') {
    if (l.designId === '') errors[`${path}.designId`] = `${side}-type leg: pick a leg design`;
    return { kind: 'design', designId: l.designId };
  }
  if (l.kind === 'run') {
    if (l.runId.trim() === '') errors[`${path}.runId`] = `${side}-type leg: pick a run`;
    return { kind: 'run', runId: l.runId.trim(), leg: l.leg };
  }
  if (l.familyId === '') errors[`${path}.familyId`] = `${side}-type leg: pick a family`;
  const perCm3 = numberFromText(errors, `${path}.perCm3`, l.perCm3, 'Doping (cm⁻³)');
  const lengthMm = numberFromText(errors, `${path}.lengthMm`, l.lengthMm, 'Leg length (mm)');
  const areaMm2 = numberFromText(errors, `${path}.areaMm2`, l.areaMm2, 'Leg area (mm²)');
  if (perCm3 === undefined || lengthMm === undefined || areaMm2 === undefined) return null;
  return { kind: 'family', familyId: l.familyId, perCm3, lengthMm, areaMm2 };
}

/** A saved leg source back into the form's text. */
export function legTextFrom(s: z.input<typeof coupleLegSourceSchema>): LegText {
  if (s.kind === 'design') return { ...emptyLeg('design'), designId: s.designId };
  if (s.kind === 'run') return { ...emptyLeg('run', s.runId), leg: s.leg ?? 'optimum' };
  return { ...emptyLeg('family'), familyId: s.familyId, perCm3: formatForInput(s.perCm3), lengthMm: formatForInput(s.lengthMm), areaMm2: formatForInput(s.areaMm2) };
}

/** The form's text as a module input; messages name the field and its unit. */
export function moduleInputFrom(t: ModuleText): { input: ModuleInput | null; errors: FieldErrors } {
  const errors: FieldErrors = {};
  const num = (field: string, text: string, what: string, optional = false) => numberFromText(errors, field, text, what, optional);
  // A module's legs are fixed: a run's or a family's (the form offers no leg design).
  const leg = (side: 'p' | 'n', l: LegText): ModuleInput['p'] | null => {
    const s = legSourceFromText(errors, side, side, l);
    return s?.kind === 'design' ? null : s;
  };
  if (t.name.trim() === '') errors.name = 'Name is required';
  const p = leg('p', t.p);
  const n = leg('n', t.n);
  const hotSide = num('hotSide', t.hotSide, 'Hot-side temperature Th (K)');
  const deltaT = num('deltaT', t.deltaT, 'ΔT (K)');
  const couples = num('couples', t.couples, 'Couples N');
  const optional = {
    areaRatio: num('areaRatio', t.areaRatio, 'Area ratio', true),
    contactResistivity: num('contactResistivity', t.contactResistivity, 'Contact resistivity (Ω·m²)', true),
    coldPlateResistance: num('coldPlateResistance', t.coldPlateResistance, 'Cold plate resistance (K/W)', true),
    hotPlateResistance: num('hotPlateResistance', t.hotPlateResistance, 'Hot plate resistance (K/W)', true),
    currentLimit: num('currentLimit', t.currentLimit, 'Current limit (A)', true),
  };
  if (Object.keys(errors).length > 0 || !p || !n || hotSide === undefined || deltaT === undefined || couples === undefined) return { input: null, errors };
  const set = Object.fromEntries(Object.entries(optional).filter(([, v]) => v !== undefined));
  return { input: { name: t.name.trim(), p, n, hotSide, deltaT, couples, ...set }, errors };
}

/** A saved input back into the form's text. */
export function textFrom(input: ModuleInput): ModuleText {
  const opt = formatForInput;
  return {
    name: input.name,
    p: legTextFrom(input.p),
    n: legTextFrom(input.n),
    hotSide: formatForInput(input.hotSide),
    deltaT: formatForInput(input.deltaT),
    couples: opt(input.couples),
    areaRatio: opt(input.areaRatio),
    contactResistivity: opt(input.contactResistivity),
    coldPlateResistance: opt(input.coldPlateResistance),
    hotPlateResistance: opt(input.hotPlateResistance),
    currentLimit: opt(input.currentLimit),
  };
}

import { fieldLabels } from '@/shared/api/field-labels';
import type { BandParameters, MinorityBand } from '@/shared/engine';

export type BandNumberKey = Exclude<keyof BandParameters, 'carrier' | 'minority'>;

export type MinorityKey = keyof MinorityBand;

export type ParameterInfo<K extends string = BandNumberKey> = {
  key: K;
  label: string;
  symbol: string;
  /** Unit on screen; the stored value uses the same unit. */
  unit: string;
  /** One line on what it means, for the form and the detail table. */
  explanation: string;
  example: string;
};

/** The band model's numbers, in the order a physicist reads them. */
export const bandParameters: readonly ParameterInfo[] = [
  {
    key: 'effectiveMass',
    label: fieldLabels['definition.effectiveMass'],
    symbol: 'm*',
    unit: 'm₀',
    explanation: 'Density-of-states mass over the free-electron mass; a heavier band gives a larger S at the same doping.',
    example: '1.0',
  },
  {
    key: 'mobility300',
    label: fieldLabels['definition.mobility300'],
    symbol: 'μ₃₀₀',
    unit: 'cm²/(V·s)',
    explanation: 'Drift mobility of non-degenerate carriers at 300 K; with the doping it sets σ.',
    example: '350',
  },
  {
    key: 'mobilityExponent',
    label: fieldLabels['definition.mobilityExponent'],
    symbol: 'a',
    unit: '',
    explanation: 'μ follows (T/300 K)^a; about −1.5 when acoustic phonons limit the mobility.',
    example: '-1.5',
  },
  {
    key: 'latticeKappa300',
    label: fieldLabels['definition.latticeKappa300'],
    symbol: 'κL,300',
    unit: 'W/(m·K)',
    explanation: 'Heat carried by lattice vibrations alone; the carriers add L·σ·T on top.',
    example: '1.0',
  },
  {
    key: 'latticeKappaExponent',
    label: fieldLabels['definition.latticeKappaExponent'],
    symbol: 'b',
    unit: '',
    explanation: 'κL follows (T/300 K)^b; about −1 when phonon–phonon (umklapp) scattering dominates.',
    example: '-1',
  },
];

export const carrierExplanation =
  'Holes (p) or electrons (n) carry the current; this fixes the sign of S.';

/** The minority band's numbers (two-band, bipolar model). */
export const minorityParameters: readonly ParameterInfo<MinorityKey>[] = [
  {
    key: 'bandGap',
    label: fieldLabels['definition.minority.bandGap'],
    symbol: 'Eg0',
    unit: 'eV',
    explanation: 'Energy gap to the minority band, extrapolated to 0 K; a narrow gap (bismuth telluride ≈ 0.2 eV) lets carriers across it at room temperature.',
    example: '0.2',
  },
  {
    key: 'bandGapSlope',
    label: fieldLabels['definition.minority.bandGapSlope'],
    symbol: 'β',
    unit: 'eV/K',
    explanation: 'Eg(T) = Eg0 − β·T; positive when the gap narrows as it warms (typically 1e-4 to 5e-4 eV/K).',
    example: '1e-4',
  },
  {
    key: 'effectiveMass',
    label: fieldLabels['definition.minority.effectiveMass'],
    symbol: 'm*min',
    unit: 'm₀',
    explanation: 'Density-of-states mass of the band across the gap (electrons of a p-type family, holes of an n-type one).',
    example: '1.0',
  },
  {
    key: 'mobility300',
    label: fieldLabels['definition.minority.mobility300'],
    symbol: 'μmin,300',
    unit: 'cm²/(V·s)',
    explanation: 'Non-degenerate drift mobility of the minority carriers; the faster they are, the sooner they cut S.',
    example: '600',
  },
  {
    key: 'mobilityExponent',
    label: fieldLabels['definition.minority.mobilityExponent'],
    symbol: 'amin',
    unit: '',
    explanation: 'μmin follows (T/300 K)^a; about −1.5 for acoustic phonons.',
    example: '-1.5',
  },
];

export const minorityExplanation =
  'A second band across a gap. Where it holds enough carriers (a hot, lightly doped slice) they lower S and add bipolar heat conduction; the doping is then the net doping.';

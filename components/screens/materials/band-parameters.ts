import type { BandParameters } from '@/shared/engine';

export type BandNumberKey = Exclude<keyof BandParameters, 'carrier'>;

export type ParameterInfo = {
  key: BandNumberKey;
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
    label: 'Effective mass',
    symbol: 'm*',
    unit: 'm₀',
    explanation: 'Density-of-states mass over the free-electron mass; a heavier band gives a larger S at the same doping.',
    example: '1.0',
  },
  {
    key: 'mobility300',
    label: 'Mobility at 300 K',
    symbol: 'μ₃₀₀',
    unit: 'cm²/(V·s)',
    explanation: 'Drift mobility of non-degenerate carriers at 300 K; with the doping it sets σ.',
    example: '350',
  },
  {
    key: 'mobilityExponent',
    label: 'Mobility exponent',
    symbol: 'a',
    unit: '',
    explanation: 'μ follows (T/300 K)^a; about −1.5 when acoustic phonons limit the mobility.',
    example: '-1.5',
  },
  {
    key: 'latticeKappa300',
    label: 'Lattice thermal conductivity at 300 K',
    symbol: 'κL,300',
    unit: 'W/(m·K)',
    explanation: 'Heat carried by lattice vibrations alone; the carriers add L·σ·T on top.',
    example: '1.0',
  },
  {
    key: 'latticeKappaExponent',
    label: 'Lattice κ exponent',
    symbol: 'b',
    unit: '',
    explanation: 'κL follows (T/300 K)^b; about −1 when phonon–phonon (umklapp) scattering dominates.',
    example: '-1',
  },
];

export const carrierExplanation =
  'Holes (p) or electrons (n) carry the current; this fixes the sign of S.';

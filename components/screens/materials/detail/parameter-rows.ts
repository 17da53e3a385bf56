import { figureOfMerit, type MaterialInput } from '@/shared/engine';
import { formatNumber, formatScientific } from '@/components/format/number';
import { bandParameters, carrierExplanation, minorityExplanation, minorityParameters } from '../band-parameters';
import { carrierLabel } from '../family-labels';

/** One line of the parameters table, already in trade units. */
export type ParameterRow = { key: string; label: string; value: string; unit: string; explanation?: string };

type TableRows = Extract<MaterialInput, { kind: 'table' }>['rows'];

function range(values: number[], format: (v: number) => string): string {
  const low = Math.min(...values);
  const high = Math.max(...values);
  return low === high ? format(low) : `${format(low)} to ${format(high)}`;
}

function tableRows(rows: TableRows): ParameterRow[] {
  const dopings = new Set(rows.map((r) => r.perCm3)).size;
  const temperatures = [...new Set(rows.map((r) => r.temperature))].sort((a, b) => a - b);
  return [
    { key: 'points', label: 'Measured points', value: `${rows.length} (${dopings} dopings × ${temperatures.length} temperatures)`, unit: '' },
    { key: 'doping', label: 'Carrier concentration n', value: range(rows.map((r) => r.perCm3), (v) => formatScientific(v, 3)), unit: 'cm⁻³' },
    { key: 'temperature', label: 'Temperatures T', value: temperatures.map((t) => formatNumber(t, 4)).join(', '), unit: 'K' },
    { key: 'seebeck', label: 'Seebeck coefficient S', value: range(rows.map((r) => r.seebeck * 1e6), (v) => formatNumber(v)), unit: 'µV/K' },
    { key: 'sigma', label: 'Electrical conductivity σ', value: range(rows.map((r) => r.sigma / 100), (v) => formatNumber(v)), unit: 'S/cm' },
    { key: 'kappa', label: 'Thermal conductivity κ', value: range(rows.map((r) => r.kappa), (v) => formatNumber(v)), unit: 'W/(m·K)' },
  ];
}

function minorityRows(minority: Extract<MaterialInput, { kind: 'band' }>['minority']): ParameterRow[] {
  if (!minority) return [{ key: 'minority', label: 'Minority band', value: 'none (one band)', unit: '', explanation: minorityExplanation }];
  return [
    { key: 'minority', label: 'Minority band', value: 'yes (two bands)', unit: '', explanation: minorityExplanation },
    ...minorityParameters.map((p) => ({ key: `minority-${p.key}`, label: `${p.label} ${p.symbol}`, value: formatNumber(minority[p.key], 4), unit: p.unit, explanation: p.explanation })),
  ];
}

/** What the parameters table lists for each kind of family. */
export function parameterRows(definition: MaterialInput): ParameterRow[] {
  switch (definition.kind) {
    case 'band':
      return [
        { key: 'carrier', label: 'Carrier type', value: carrierLabel(definition.carrier).text, unit: '', explanation: carrierExplanation },
        ...bandParameters.map((p) => ({
          key: p.key,
          label: `${p.label} ${p.symbol}`,
          value: formatNumber(definition[p.key], 4),
          unit: p.unit,
          explanation: p.explanation,
        })),
        ...minorityRows(definition.minority),
      ];
    case 'constant':
      return [
        { key: 'seebeck', label: 'Seebeck coefficient S', value: formatNumber(definition.seebeck * 1e6, 4), unit: 'µV/K' },
        { key: 'sigma', label: 'Electrical conductivity σ', value: formatNumber(definition.sigma / 100, 4), unit: 'S/cm' },
        { key: 'kappa', label: 'Thermal conductivity κ', value: formatNumber(definition.kappa, 4), unit: 'W/(m·K)' },
        {
          key: 'zT',
          label: 'zT at 300 K',
          value: formatNumber(figureOfMerit(definition, 300), 3),
          unit: '',
          explanation: 'S²σT/κ at 300 K; the same S, σ and κ hold at every temperature.',
        },
      ];
    case 'table':
      return tableRows(definition.rows);
  }
}

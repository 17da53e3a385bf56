/**
 * The header grammar of a measured-family CSV: each header is
 * `<quantity>_<unit>`, e.g. `seebeck_uV_per_K`. The unit is never guessed: a
 * known quantity with a missing or unknown unit is an error that lists the
 * units we accept. Conversions go to the engine's units (cm⁻³, K, V/K, S/m,
 * W/(m·K)); resistivity becomes conductivity.
 */
export type Quantity = 'perCm3' | 'temperature' | 'seebeck' | 'sigma' | 'resistivity' | 'kappa' | 'position';

type Unit = { unit: string; label: string; convert: (v: number) => number; describe: string };

const units: Record<Quantity, Unit[]> = {
  perCm3: [
    { unit: 'per_cm3', label: 'cm⁻³', convert: (v) => v, describe: '× 1' },
    { unit: 'per_m3', label: 'm⁻³', convert: (v) => v * 1e-6, describe: '× 1e-6 (m⁻³ → cm⁻³)' },
  ],
  temperature: [
    { unit: 'k', label: 'K', convert: (v) => v, describe: '× 1' },
    { unit: 'c', label: '°C', convert: (v) => v + 273.15, describe: '+ 273.15 (°C → K)' },
  ],
  seebeck: [
    { unit: 'uv_per_k', label: 'µV/K', convert: (v) => v * 1e-6, describe: '× 1e-6 (µV/K → V/K)' },
    { unit: 'mv_per_k', label: 'mV/K', convert: (v) => v * 1e-3, describe: '× 1e-3 (mV/K → V/K)' },
    { unit: 'v_per_k', label: 'V/K', convert: (v) => v, describe: '× 1' },
  ],
  sigma: [
    { unit: 's_per_cm', label: 'S/cm', convert: (v) => v * 100, describe: '× 100 (S/cm → S/m)' },
    { unit: 's_per_m', label: 'S/m', convert: (v) => v, describe: '× 1' },
  ],
  resistivity: [
    { unit: 'uohm_m', label: 'µΩ·m', convert: (v) => 1 / (v * 1e-6), describe: 'σ = 1 / (ρ × 1e-6) (µΩ·m → S/m)' },
    { unit: 'mohm_cm', label: 'mΩ·cm', convert: (v) => 1 / (v * 1e-5), describe: 'σ = 1 / (ρ × 1e-5) (mΩ·cm → S/m)' },
    { unit: 'ohm_cm', label: 'Ω·cm', convert: (v) => 1 / (v * 1e-2), describe: 'σ = 1 / (ρ × 1e-2) (Ω·cm → S/m)' },
    { unit: 'ohm_m', label: 'Ω·m', convert: (v) => 1 / v, describe: 'σ = 1 / ρ (Ω·m → S/m)' },
  ],
  position: [
    { unit: 'mm', label: 'mm', convert: (v) => v, describe: '× 1' },
    { unit: 'um', label: 'µm', convert: (v) => v * 1e-3, describe: '× 1e-3 (µm → mm)' },
  ],
  kappa: [
    { unit: 'w_per_m_k', label: 'W/(m·K)', convert: (v) => v, describe: '× 1' },
    { unit: 'w_per_mk', label: 'W/(m·K)', convert: (v) => v, describe: '× 1' },
  ],
};

/** Names a header may start with, for each quantity (longest first when matching). */
const names: Array<[string, Quantity]> = [
  ['carrier_concentration', 'perCm3'],
  ['electrical_conductivity', 'sigma'],
  ['thermal_conductivity', 'kappa'],
  ['temperature', 'temperature'],
  ['position', 'position'],
  ['resistivity', 'resistivity'],
  ['conductivity', 'sigma'],
  ['seebeck', 'seebeck'],
  ['doping', 'perCm3'],
  ['sigma', 'sigma'],
  ['kappa', 'kappa'],
  ['rho', 'resistivity'],
  ['n', 'perCm3'],
  ['x', 'position'],
];

export type Column = { header: string; quantity: Quantity; unit: string; toEngine: string; convert: (v: number) => number };
export type HeaderVerdict = { kind: 'column'; column: Column } | { kind: 'error'; message: string } | { kind: 'ignored' };

function normalise(header: string): string {
  return header.trim().toLowerCase().replace(/[µμ]/g, 'u').replace(/[\s\-/]+/g, '_').replace(/[()]/g, '');
}

const suggestions = (q: Quantity): string => units[q].map((u) => u.unit).join(', ');

/** Reads one header; a recognised quantity with an unknown unit is an error, an unknown name is ignored. */
export function readHeader(header: string): HeaderVerdict {
  const h = normalise(header);
  for (const [name, quantity] of names) {
    if (h !== name && !h.startsWith(`${name}_`)) continue;
    const unitPart = h.slice(name.length + 1);
    const unit = units[quantity].find((u) => u.unit === unitPart);
    if (unit) return { kind: 'column', column: { header, quantity, unit: unit.label, toEngine: unit.describe, convert: unit.convert } };
    const said = unitPart ? `unit "${unitPart}" is not one we convert` : 'it has no unit';
    return { kind: 'error', message: `column "${header}": ${said}; write it as ${name}_<unit> with one of: ${suggestions(quantity)}` };
  }
  return { kind: 'ignored' };
}

/** The header a CSV export writes for each quantity (the parser reads them back). */
export const exportHeaders = {
  perCm3: 'n_per_cm3',
  temperature: 'temperature_K',
  seebeck: 'seebeck_uV_per_K',
  sigma: 'sigma_S_per_cm',
  kappa: 'kappa_W_per_m_K',
} as const;

import type { FamilyDetailResponse, FamilySummary } from '@/shared/api/families';
import type { UploadPreview } from '@/shared/api/family-upload';

export const team = { id: 'team-1', name: 'Northlight Sensors — detector cooling group' };

export const bandId = '11111111-1111-4111-8111-111111111111';

/** A family summary with invented values; override what a test is about. */
export function familySummary(overrides: Partial<FamilySummary> = {}): FamilySummary {
  return {
    id: bandId,
    name: 'Graded p-leg model',
    kind: 'band',
    carrier: 'p',
    summary: 'Single parabolic band, acoustic-phonon scattering.',
    source: 'Lab notebook 4, p. 12',
    createdBy: 'ada@northlight.example',
    createdAt: '2025-11-03T09:30:00.000Z',
    isDemo: false,
    version: 3,
    archived: false,
    updatedAt: '2026-01-20T16:00:00.000Z',
    ...overrides,
  };
}

const bandDefinition = {
  kind: 'band',
  carrier: 'p',
  effectiveMass: 1.2,
  mobility300: 280,
  mobilityExponent: -1.5,
  latticeKappa300: 0.9,
  latticeKappaExponent: -1,
} as const;

/** Version 3 of a band family; versions 1 and 2 were used by runs. */
export function bandDetail(overrides: Partial<FamilyDetailResponse['current']> = {}): FamilyDetailResponse {
  const version = (n: number, runCount: number) => ({
    version: n,
    summary: 'Single parabolic band, acoustic-phonon scattering.',
    source: `Fit to ingot 7, revision ${n}`,
    createdBy: n === 1 ? 'ada@northlight.example' : 'piet@northlight.example',
    createdAt: `2026-01-0${n}T10:00:00.000Z`,
    runCount,
  });
  return {
    family: familySummary(),
    current: { ...version(3, 0), definition: bandDefinition, ...overrides },
    versions: [version(3, 0), version(2, 1), version(1, 4)],
  };
}

/** A preview of a 2 × 3 grid with one point missing, one bad cell and one suspicious value. */
export function brokenPreview(): UploadPreview {
  return {
    ok: false,
    rowCount: 5,
    columns: [
      { header: 'n_per_cm3', quantity: 'perCm3', unit: 'cm⁻³', toEngine: '× 1' },
      { header: 'temperature_K', quantity: 'temperature', unit: 'K', toEngine: '× 1' },
      { header: 'seebeck_uV_per_K', quantity: 'seebeck', unit: 'µV/K', toEngine: '× 1e-6 (µV/K → V/K)' },
      { header: 'resistivity_mOhm_cm', quantity: 'resistivity', unit: 'mΩ·cm', toEngine: 'σ = 1 / (ρ × 1e-5)' },
      { header: 'kappa_W_per_m_K', quantity: 'kappa', unit: 'W/(m·K)', toEngine: '× 1' },
    ],
    rows: [
      { line: 2, perCm3: 1e19, temperature: 250, seebeck: 190e-6, sigma: 9e4, kappa: 1.5 },
      { line: 3, perCm3: 1e19, temperature: 300, seebeck: 2e-10, sigma: 8e4, kappa: 1.4 },
      { line: 4, perCm3: 1e19, temperature: 350, seebeck: 215e-6, sigma: 7e4, kappa: 1.35 },
      { line: 5, perCm3: 3e19, temperature: 250, seebeck: 150e-6, sigma: 2.4e5, kappa: 2.1 },
      { line: 6, perCm3: 3e19, temperature: 300, seebeck: 160e-6, sigma: 2.1e5, kappa: 2.0 },
    ],
    carrier: 'p',
    coverage: { dopings: [1e19, 3e19], temperatures: [250, 300, 350], measured: 5, holes: 1, firstHoles: [{ perCm3: 3e19, temperature: 350 }], present: [[true, true, true], [true, true, false]] },
    warnings: [{ line: 3, column: 'seebeck_uV_per_K', message: 'suspicious magnitude: below 1 µV/K: was it written in V/K under a µV/K header?' }],
    errors: [
      { line: 7, column: 'kappa_W_per_m_K', message: '"1,3" is not a number' },
      { message: 'the grid has 1 hole(s): missing n = 3.00e+19 cm⁻³ at 350 K' },
    ],
  };
}

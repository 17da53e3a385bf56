/**
 * Demo data for an invented lab: Northlight Sensors' detector-cooling group,
 * who need a small Peltier stage under an infrared detector. The numbers are
 * typical of bismuth-telluride alloys near room temperature, quoted from
 * memory as round values — they illustrate the tool and are not measurements.
 */
export const demoTeam = { slug: 'northlight', name: 'Northlight Sensors — detector cooling group' };
export const otherTeam = { slug: 'harbour-cryo', name: 'Harbour Cryo Lab (second demo team)' };

export type DemoFamily = {
  name: string;
  kind: 'band' | 'table' | 'constant';
  carrier: 'p' | 'n' | null;
  summary: string;
  source: string;
  definition: Record<string, unknown>;
};

export const demoFamilies: DemoFamily[] = [
  {
    name: 'NL-P7 (Bi,Sb)₂Te₃-like, p-type band model',
    kind: 'band',
    carrier: 'p',
    summary: 'Single parabolic band, acoustic-phonon scattering; m* = 1.0 m₀, μ₀ = 350 cm²/(V·s)·(T/300 K)^−1.5, κL = 1.0 W/(m·K)·(T/300 K)^−1.',
    source: 'Demo data: typical values for a p-type bismuth-telluride alloy, from memory; not a measurement.',
    definition: { kind: 'band', carrier: 'p', effectiveMass: 1.0, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1.0, latticeKappaExponent: -1 },
  },
  {
    name: 'NL-N3 Bi₂(Te,Se)₃-like, n-type band model',
    kind: 'band',
    carrier: 'n',
    summary: 'Single parabolic band, acoustic-phonon scattering; m* = 1.1 m₀, μ₀ = 300 cm²/(V·s)·(T/300 K)^−1.5, κL = 1.3 W/(m·K)·(T/300 K)^−1.',
    source: 'Demo data: typical values for an n-type bismuth-telluride alloy, from memory; not a measurement.',
    definition: { kind: 'band', carrier: 'n', effectiveMass: 1.1, mobility300: 300, mobilityExponent: -1.5, latticeKappa300: 1.3, latticeKappaExponent: -1 },
  },
  {
    name: 'Reference leg, constant properties',
    kind: 'constant',
    carrier: 'p',
    summary: 'S = 200 µV/K, σ = 1000 S/cm, κ = 1.5 W/(m·K) at every temperature: the textbook leg for checking closed-form limits.',
    source: 'Demo data: round numbers chosen for hand checks.',
    definition: { kind: 'constant', seebeck: 200e-6, sigma: 1e5, kappa: 1.5 },
  },
];

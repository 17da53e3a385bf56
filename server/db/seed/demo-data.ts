import { familyFromMaterial, propertiesAt, type MaterialInput } from '../../../shared/engine';
import { mulberry32 } from '../../../shared/random';

/**
 * Demo data for an invented lab: Northlight Sensors' detector-cooling group,
 * who need a small Peltier stage under an infrared detector. The numbers are
 * typical of bismuth-telluride alloys near room temperature, quoted from
 * memory as round values — they illustrate the tool and are not measurements.
 */
export const demoTeam = { slug: 'northlight', name: 'Northlight Sensors — detector cooling group' };
export const otherTeam = { slug: 'harbour-cryo', name: 'Harbour Cryo Lab (second demo team)' };

export type DemoFamily = { name: string; summary: string; source: string; definition: MaterialInput };

const modelFamilies: DemoFamily[] = [
  {
    name: 'NL-P7 (Bi,Sb)₂Te₃-like, p-type band model',
    summary:
      'Two parabolic bands, acoustic-phonon scattering. Holes: m* = 1.0 m₀, μ₀ = 350 cm²/(V·s)·(T/300 K)^−1.5; electrons across the gap: m* = 1.0 m₀, μ₀ = 600 cm²/(V·s)·(T/300 K)^−1.5; ' +
      'Eg = 0.20 eV − 1.0e-4 eV/K·T (0.17 eV at 300 K); κL = 1.0 W/(m·K)·(T/300 K)^−1.',
    source: 'Demo data: typical values for a p-type bismuth-telluride alloy, band gap and minority mobility included, quoted from memory; not a measurement.',
    definition: {
      kind: 'band', carrier: 'p', effectiveMass: 1.0, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1.0, latticeKappaExponent: -1,
      minority: { effectiveMass: 1.0, mobility300: 600, mobilityExponent: -1.5, bandGap: 0.2, bandGapSlope: 1e-4 },
    },
  },
  {
    name: 'NL-N3 Bi₂(Te,Se)₃-like, n-type band model',
    summary:
      'Two parabolic bands, acoustic-phonon scattering. Electrons: m* = 1.1 m₀, μ₀ = 300 cm²/(V·s)·(T/300 K)^−1.5; holes across the gap: m* = 1.0 m₀, μ₀ = 200 cm²/(V·s)·(T/300 K)^−1.5; ' +
      'Eg = 0.22 eV − 1.0e-4 eV/K·T (0.19 eV at 300 K); κL = 1.3 W/(m·K)·(T/300 K)^−1.',
    source: 'Demo data: typical values for an n-type bismuth-telluride alloy, band gap and minority mobility included, quoted from memory; not a measurement.',
    definition: {
      kind: 'band', carrier: 'n', effectiveMass: 1.1, mobility300: 300, mobilityExponent: -1.5, latticeKappa300: 1.3, latticeKappaExponent: -1,
      minority: { effectiveMass: 1.0, mobility300: 200, mobilityExponent: -1.5, bandGap: 0.22, bandGapSlope: 1e-4 },
    },
  },
  {
    name: 'Reference leg, constant properties',
    summary: 'S = 200 µV/K, σ = 1000 S/cm, κ = 1.5 W/(m·K) at every temperature: the textbook leg for checking closed-form limits.',
    source: 'Demo data: round numbers chosen for hand checks.',
    definition: { kind: 'constant', seebeck: 200e-6, sigma: 1e5, kappa: 1.5 },
  },
];

/**
 * An invented "measured" table: the p-type model sampled on an uneven grid
 * (no sample between 3e19 and 1.2e20 cm⁻³, so the upload preview shows a
 * sparse region) with ±2 % scatter on S and ±3 % on σ and κ.
 */
function measuredDemo(): DemoFamily {
  const model = familyFromMaterial(modelFamilies[0]!.definition);
  const rnd = mulberry32(7);
  const jitter = (v: number, rel: number): number => v * (1 + rel * (2 * rnd() - 1));
  // From 3e18 cm⁻³ up: below it the two-band model's hottest samples turn n-type
  // (bipolar conduction), and a table holds one carrier type.
  const dopings = [3e18, 4e18, 6e18, 8e18, 1.5e19, 3e19, 1.2e20];
  const temperatures = [220, 250, 280, 300, 330, 360, 400];
  const rows = dopings.flatMap((n) => temperatures.map((t) => {
    const p = propertiesAt(model, n, t);
    const r = (v: number): number => Number(v.toPrecision(4));
    return { perCm3: n, temperature: t, seebeck: r(jitter(p.seebeck, 0.02)), sigma: r(jitter(p.sigma, 0.03)), kappa: r(jitter(p.kappa, 0.03)) };
  }));
  return {
    name: 'NL-P7 ingot batch 7, measured (demo)',
    summary: '7 carrier concentrations × 7 temperatures, 220–400 K; no sample between 3e19 and 1.2e20 cm⁻³.',
    source: 'Demo data: generated from the NL-P7 band model with ±2–3 % invented scatter to look like Hall, Seebeck and laser-flash measurements; not a measurement.',
    definition: { kind: 'table', rows },
  };
}

export function demoFamilies(): DemoFamily[] {
  return [...modelFamilies, measuredDemo()];
}

/**
 * A demo module of the detector project, so the Modules page and the
 * comparison have something to show before anyone builds one: both demo band
 * models at uniform doping (p near its best uniform doping for ΔT, from the
 * engine benchmark; n at 2e19 cm⁻³), 31 couples of 1.5 mm × 1 mm² legs, a
 * contact resistivity of 5e-10 Ω·m² per junction (an invented, typical-looking
 * value) and a 5 A bench supply limit. Invented settings, not a product.
 */
export const demoModule = {
  name: 'Demo: detector stage, 31 uniform couples',
  notes: 'Demo data: both legs at uniform doping, for comparing with couples built from graded runs.',
  pFamily: { name: modelFamilies[0]!.name, perCm3: 1.6e19, lengthMm: 1.5, areaMm2: 1 },
  nFamily: { name: modelFamilies[1]!.name, perCm3: 2e19, lengthMm: 1.5, areaMm2: 1 },
  hotSide: 300,
  deltaT: 30,
  couples: 31,
  contactResistivity: 5e-10,
  currentLimit: 5,
};

/**
 * A demo cascade for the detector project: three stages of the demo band
 * models at uniform doping (as in the demo module), coldest first, under a
 * 300 K sink with 5 mW on the detector, the couple counts optimised within
 * 78 couples, all stages in series on one supply, and a grease-and-ceramic
 * interface of a few hundredths of a K/W between stages. Invented settings
 * to show the Stages page, not a product.
 */
const demoLegs = { p: { perCm3: 1.6e19, lengthMm: 1.2, areaMm2: 0.6 }, n: { perCm3: 2e19, lengthMm: 1.2, areaMm2: 0.6 } };
export const demoCascade = {
  name: 'Demo: detector cascade, 3 uniform stages',
  notes: 'Demo data: invented settings; legs at uniform doping from the NL-P7 and NL-N3 band models.',
  hotSide: 300,
  heatLoad: 0.005,
  wiring: 'series' as const,
  objective: 'maxDeltaT' as const,
  /** Coldest first: the optimiser's start for the pyramid. */
  stages: [{ couples: 6, interfaceResistance: 0.05 }, { couples: 18, interfaceResistance: 0.03 }, { couples: 54, interfaceResistance: 0.02 }],
  couplesTotal: 78,
  starts: 2,
  pFamily: modelFamilies[0]!.name,
  nFamily: modelFamilies[1]!.name,
  legs: demoLegs,
};

/**
 * A demo matched couple: the same two band models at uniform doping, the
 * n/p area ratio and the current free, for the largest ΔT without load. The
 * demo lab has no leg designs, so the legs are families (invented settings).
 */
export const demoCouple = {
  name: 'Demo: matched couple, NL-P7 with NL-N3',
  notes: 'Demo data: invented settings; the area ratio is left free to show how far the two legs are from matched.',
  hotSide: 300,
  heatLoad: 0,
  objective: 'maxDeltaT' as const,
  starts: 2,
  pFamily: modelFamilies[0]!.name,
  nFamily: modelFamilies[1]!.name,
  legs: demoLegs,
};

/** Demo accounts, one per role in the demo lab and one in the second team; all share one password. */
export const demoPassword = 'graded-legs-demo';
export const demoUsers = [
  { email: 'ada@northlight.example', displayName: 'Ada Lindqvist', role: 'admin', team: demoTeam.slug },
  { email: 'piet@northlight.example', displayName: 'Piet Okafor', role: 'physicist', team: demoTeam.slug },
  { email: 'greta@northlight.example', displayName: 'Greta Moreau', role: 'grower', team: demoTeam.slug },
  { email: 'vic@northlight.example', displayName: 'Vic Tanaka', role: 'viewer', team: demoTeam.slug },
  { email: 'hana@harbour.example', displayName: 'Hana Brooks', role: 'admin', team: otherTeam.slug },
] as const;

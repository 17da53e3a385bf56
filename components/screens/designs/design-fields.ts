/**
 * The design's fields as people see them: label, unit and one line on what
 * the value means. The form, the design page and the run page all read
 * from here, so a field is named the same everywhere.
 */
export type DesignNumberKey =
  | 'lengthMm'
  | 'areaMm2'
  | 'hotSide'
  | 'heatLoad'
  | 'coldSide'
  | 'minPerCm3'
  | 'maxPerCm3'
  | 'controlPoints'
  | 'starts'
  | 'minZoneMm'
  | 'coldContactMicroOhmCm2'
  | 'hotContactMicroOhmCm2'
  | 'parasiticLoadW'
  | 'emissivity'
  | 'surroundingsK';

export type FieldInfo = { label: string; unit: string; help: string; placeholder?: string };

export const designFieldInfo: Record<DesignNumberKey | 'name' | 'notes' | 'familyId' | 'objective' | 'monotone' | 'familyVersion' | 'parasitic', FieldInfo> = {
  name: { label: 'Name', unit: '', help: 'How the team will recognise this design in lists and e-mails.' },
  notes: { label: 'Notes', unit: '', help: 'Anything the next reader should know: purpose, assumptions, links.' },
  familyId: { label: 'Material family', unit: '', help: 'Whose S, σ and κ the leg is made of; the version is frozen into every run.' },
  familyVersion: { label: 'Family version', unit: '', help: 'Runs keep the version they were launched with.' },
  objective: { label: 'Objective', unit: '', help: 'What the optimiser maximises.' },
  lengthMm: { label: 'Leg length L', unit: 'mm', help: 'From the cold end to the heat sink.', placeholder: '1.5' },
  areaMm2: { label: 'Cross-section A', unit: 'mm²', help: 'Area of the leg, perpendicular to the current.', placeholder: '1' },
  hotSide: { label: 'Hot-side temperature Th', unit: 'K', help: 'Held by the heat sink (300 K ≈ 27 °C).', placeholder: '300' },
  heatLoad: { label: 'Heat load Qc', unit: 'W', help: 'Heat drawn from the cooled object; 0 for the largest drop.', placeholder: '0' },
  coldSide: { label: 'Cold-side target Tc', unit: 'K', help: 'Required for the heat-load and COP objectives; below Th.', placeholder: '250' },
  minPerCm3: { label: 'Lowest doping', unit: 'cm⁻³', help: 'The least the grower can dope (write 1e18 for 10¹⁸).', placeholder: '1e18' },
  maxPerCm3: { label: 'Highest doping', unit: 'cm⁻³', help: 'The most the grower can dope.', placeholder: '1e20' },
  controlPoints: { label: 'Control points', unit: 'nodes', help: 'Doping nodes from end to end, 2–41; more nodes, finer grading.', placeholder: '11' },
  monotone: { label: 'Monotone profile', unit: '', help: 'Doping only rises or only falls along the leg (easier to grow).' },
  starts: {
    label: 'Search starts',
    unit: 'starts',
    help: 'Each start is a full local optimisation; the best wins. More starts, more confidence, longer runs (1–5000; a start takes tens of milliseconds to seconds).',
    placeholder: '16',
  },
  minZoneMm: { label: 'Shortest zone', unit: 'mm', help: 'The shortest constant-doping zone the grower can make.', placeholder: '0' },
  coldContactMicroOhmCm2: {
    label: 'Cold contact ρc',
    unit: 'µΩ·cm²',
    help: 'Of the cold junction; good contacts are 1–10 (1 µΩ·cm² = 10⁻¹⁰ Ω·m²). Its heat costs ΔT.',
    placeholder: '0',
  },
  hotContactMicroOhmCm2: { label: 'Hot contact ρc', unit: 'µΩ·cm²', help: 'Of the hot junction; its heat goes to the sink, costing power but no ΔT.', placeholder: '0' },
  parasitic: { label: 'Parasitic heat', unit: '', help: 'Heat reaching the cold side that is not the load, per leg.' },
  parasiticLoadW: { label: 'Parasitic load', unit: 'W', help: 'Per leg, onto the cold end: gas conduction, wires, radiation onto the cold stage.', placeholder: '0.002' },
  emissivity: { label: 'Emissivity ε', unit: '', help: 'Of the leg’s sides, 0–1 (bare tellurides ~0.1–0.3, blackened ~0.9).', placeholder: '0.3' },
  surroundingsK: { label: 'Surroundings Ts', unit: 'K', help: 'Temperature of what the leg’s sides see (often the sink’s).', placeholder: '300' },
};

import { fieldLabels } from '@/shared/api/field-labels';

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
  name: { label: fieldLabels.name, unit: '', help: 'How the team will recognise this design in lists and e-mails.' },
  notes: { label: fieldLabels.notes, unit: '', help: 'Anything the next reader should know: purpose, assumptions, links.' },
  familyId: { label: fieldLabels.familyId, unit: '', help: 'Whose S, σ and κ the leg is made of; the version is frozen into every run.' },
  familyVersion: { label: fieldLabels.familyVersion, unit: '', help: 'Runs keep the version they were launched with.' },
  objective: { label: fieldLabels.objective, unit: '', help: 'What the optimiser maximises.' },
  lengthMm: { label: fieldLabels.lengthMm, unit: 'mm', help: 'From the cold end to the heat sink.', placeholder: '1.5' },
  areaMm2: { label: fieldLabels.areaMm2, unit: 'mm²', help: 'Area of the leg, perpendicular to the current.', placeholder: '1' },
  hotSide: { label: fieldLabels.hotSide, unit: 'K', help: 'Held by the heat sink (300 K ≈ 27 °C).', placeholder: '300' },
  heatLoad: { label: fieldLabels.heatLoad, unit: 'W', help: 'Heat drawn from the cooled object; 0 for the largest drop.', placeholder: '0' },
  coldSide: { label: fieldLabels.coldSide, unit: 'K', help: 'Required for the heat-load and COP objectives; below Th.', placeholder: '250' },
  minPerCm3: { label: fieldLabels.minPerCm3, unit: 'cm⁻³', help: 'The least the grower can dope (write 1e18 for 10¹⁸).', placeholder: '1e18' },
  maxPerCm3: { label: fieldLabels.maxPerCm3, unit: 'cm⁻³', help: 'The most the grower can dope.', placeholder: '1e20' },
  controlPoints: { label: fieldLabels.controlPoints, unit: 'nodes', help: 'Doping nodes from end to end, 2–41; more nodes, finer grading.', placeholder: '11' },
  monotone: { label: fieldLabels.monotone, unit: '', help: 'Doping only rises or only falls along the leg (easier to grow).' },
  starts: {
    label: fieldLabels.starts,
    unit: 'starts',
    help: 'Each start is a full local optimisation; the best wins. More starts, more confidence, longer runs (1–5000; a start takes tens of milliseconds to seconds).',
    placeholder: '16',
  },
  minZoneMm: { label: fieldLabels.minZoneMm, unit: 'mm', help: 'The shortest constant-doping zone the grower can make.', placeholder: '0' },
  coldContactMicroOhmCm2: {
    label: fieldLabels.coldContactMicroOhmCm2,
    unit: 'µΩ·cm²',
    help: 'Of the cold junction; good contacts are 1–10 (1 µΩ·cm² = 10⁻¹⁰ Ω·m²). Its heat costs ΔT.',
    placeholder: '0',
  },
  hotContactMicroOhmCm2: { label: fieldLabels.hotContactMicroOhmCm2, unit: 'µΩ·cm²', help: 'Of the hot junction; its heat goes to the sink, costing power but no ΔT.', placeholder: '0' },
  parasitic: { label: fieldLabels.parasitic, unit: '', help: 'Heat reaching the cold side that is not the load, per leg.' },
  parasiticLoadW: { label: fieldLabels.parasiticLoadW, unit: 'W', help: 'Per leg, onto the cold end: gas conduction, wires, radiation onto the cold stage.', placeholder: '0.002' },
  emissivity: { label: fieldLabels.emissivity, unit: '', help: 'Of the leg’s sides, 0–1 (bare tellurides ~0.1–0.3, blackened ~0.9).', placeholder: '0.3' },
  surroundingsK: { label: fieldLabels.surroundingsK, unit: 'K', help: 'Temperature of what the leg’s sides see (often the sink’s).', placeholder: '300' },
};

import type { z } from 'zod';

/**
 * Every field of a request payload as its form labels it. Messages about a
 * field — the API's (server/http/validate.ts) and the forms' own checks —
 * name it by this label, never by its schema key: "Due date must be a date
 * like 2027-01-31", not "dueDate must …". The forms take their labels from
 * here too (components/screens/designs/design-fields.ts,
 * components/screens/materials/band-parameters.ts,
 * components/screens/modules/module-fields.tsx), so the two cannot drift.
 *
 * Keys are a payload's field keys; a full dotted path (`definition.minority.effectiveMass`)
 * wins over its last key where one key means different things in different places.
 */
export const fieldLabels = {
  // Designs (shared/api/designs.ts).
  name: 'Name',
  notes: 'Notes',
  familyId: 'Material family',
  familyVersion: 'Family version',
  objective: 'Objective',
  lengthMm: 'Leg length L',
  areaMm2: 'Cross-section A',
  hotSide: 'Hot-side temperature Th',
  heatLoad: 'Heat load Qc',
  coldSide: 'Cold-side target Tc',
  minPerCm3: 'Lowest doping',
  maxPerCm3: 'Highest doping',
  controlPoints: 'Control points',
  monotone: 'Monotone profile',
  starts: 'Search starts',
  minZoneMm: 'Shortest zone',
  coldContactMicroOhmCm2: 'Cold contact ρc',
  hotContactMicroOhmCm2: 'Hot contact ρc',
  parasitic: 'Parasitic heat',
  parasiticLoadW: 'Parasitic load',
  emissivity: 'Emissivity ε',
  surroundingsK: 'Surroundings Ts',
  // Sweeps.
  parameter: 'Swept setting',
  values: 'Values',
  // Modules (shared/api/modules.ts).
  deltaT: 'ΔT',
  couples: 'Couples N',
  areaRatio: 'Area ratio A_n / A_p',
  contactResistivity: 'Contact resistivity per junction',
  coldPlateResistance: 'Cold plate thermal resistance',
  hotPlateResistance: 'Hot plate thermal resistance',
  currentLimit: 'Supply or wire current limit',
  runId: 'Run',
  leg: 'Leg',
  perCm3: 'Doping n',
  // Coolers: matched couples and cascades (shared/api/coolers.ts).
  designId: 'Leg design',
  stages: 'Stages',
  'stages.source': 'Legs of the stage',
  interfaceResistance: 'Interface resistance to the next warmer stage',
  wiring: 'Wiring',
  couplesLimit: 'Couple count limit',
  total: 'Couples in all stages',
  baseAreaMm2: 'Base area',
  // Growth orders (shared/api/growth.ts).
  batch: 'Batch',
  dueDate: 'Due date',
  zones: 'Zones K',
  lossBudget: 'ΔT loss budget',
  measureTemperature: 'Check temperature',
  dopingScatter: 'Doping scatter per zone (1σ)',
  hallFactor: 'Hall factor r_H',
  temperature: 'Measured at',
  note: 'Note for the timeline',
  reason: 'Reason',
  verdict: 'Verdict',
  // Accounts and the team (shared/api/auth.ts).
  email: 'E-mail',
  displayName: 'Your name',
  teamName: 'Team name',
  password: 'Password',
  currentPassword: 'Current password',
  newPassword: 'New password',
  role: 'Role',
  token: 'Link',
  // Material families (shared/api/families.ts).
  summary: 'Summary',
  source: 'Source',
  definition: 'Material definition',
  'definition.carrier': 'Carrier type',
  'definition.effectiveMass': 'Effective mass',
  'definition.mobility300': 'Mobility at 300 K',
  'definition.mobilityExponent': 'Mobility exponent',
  'definition.latticeKappa300': 'Lattice thermal conductivity at 300 K',
  'definition.latticeKappaExponent': 'Lattice κ exponent',
  'definition.minority': 'Minority band',
  'definition.minority.bandGap': 'Band gap at 0 K',
  'definition.minority.bandGapSlope': 'Gap temperature coefficient',
  'definition.minority.effectiveMass': 'Minority effective mass',
  'definition.minority.mobility300': 'Minority mobility at 300 K',
  'definition.minority.mobilityExponent': 'Minority mobility exponent',
} as const satisfies Record<string, string>;

const labels: Readonly<Record<string, string>> = fieldLabels;

const legSides: Readonly<Record<string, string>> = { p: 'p-type leg', n: 'n-type leg' };

/** The label of a field path ("dueDate", "p.perCm3", "definition.rows[3].seebeck"), or undefined when it has none. */
export function labelOf(path: string): string | undefined {
  const plain = path.replace(/\[\d+\]/g, '');
  if (labels[plain]) return labels[plain];
  const keys = plain.split('.');
  // A module's legs: "p.perCm3" → "Doping n (p-type leg)".
  const side = keys.length > 1 ? legSides[keys[0]] : undefined;
  const last = labels[keys[keys.length - 1]];
  if (side && last) return `${last} (${side})`;
  return last;
}

/** Schema keys written inside a message ("… must be below hotSide"), each replaced by its label. */
const keyPattern = new RegExp(`\\b(${Object.keys(fieldLabels).filter((k) => !k.includes('.') && /[A-Z]/.test(k)).join('|')})\\b`, 'g');

/**
 * A message about `path` in the form's words: a leading schema key (or an
 * engine's "bounds.minPerCm3: …" prefix) becomes the field's label, and any
 * other schema key inside it becomes that field's label.
 */
export function wordMessage(path: string, message: string): string {
  const label = labelOf(path);
  const key = path.replace(/\[\d+\]/g, '').split('.').pop() ?? path;
  let text = message;
  const engine = /^[\w.[\]]+: (.*)$/s.exec(text);
  if (label && engine) text = `${label}: ${engine[1]}`;
  else if (label && key && (text === key || text.startsWith(`${key} `))) text = `${label}${text.slice(key.length)}`;
  // A quoted word is a value to type ("current" or "deltaT"), not a field: it stays as written.
  return text
    .split(/("[^"]*"|“[^”]*”)/)
    .map((part, i) => (i % 2 === 1 ? part : part.replace(keyPattern, (code) => labels[code] ?? code)))
    .join('');
}

/**
 * A message about a field as a sentence of its own, for a summary away from
 * the field: "Due date must be a date like …", "Run (p-type leg): no such run in this team".
 */
export function fieldSentence(path: string, message: string): string {
  const worded = wordMessage(path, message);
  const label = labelOf(path);
  // A field without a label (a table cell) keeps its path, so the message still says where —
  // unless the message names it already ("the file has 2000 rows" about `file`).
  const named = label === undefined && new RegExp(`\\b${path.replace(/[^\w]/g, '')}\\b`, 'i').test(worded);
  const name = label ?? (named ? '' : path);
  if (name && !label && !worded.startsWith(name)) return `${name}: ${worded}`;
  const text = name && !worded.startsWith(name) ? `${name}: ${worded}` : worded;
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** The dotted path of a zod issue, e.g. `definition.rows[3].seebeck`. */
export function issuePath(path: readonly PropertyKey[]): string {
  return path.reduce<string>((acc, k) => (typeof k === 'number' ? `${acc}[${k}]` : acc ? `${acc}.${String(k)}` : String(k)), '');
}

/** The subject of a message: the field's label, or "This value" for a field without one. */
const subject = (path: string) => labelOf(path) ?? (path ? `This value (${path})` : 'This value');

/**
 * One zod issue in the form's words. Schemas that write their own message
 * keep it (with keys turned into labels); zod's built-in wording
 * ("Too small: expected number to be >=100") is rewritten around the label.
 */
export function wordIssue(issue: z.core.$ZodIssue, prefix = ''): string {
  const path = [prefix, issuePath(issue.path)].filter(Boolean).join('.');
  const builtIn = /^(Invalid input|Too small|Too big|Invalid option|Unrecognized key|Invalid string|Invalid number)/.test(issue.message);
  if (!builtIn) return wordMessage(path, issue.message);
  const who = subject(path);
  switch (issue.code) {
    case 'invalid_type':
      if (issue.message.endsWith('received undefined')) return `${who} is required`;
      return `${who} must be ${issue.expected === 'number' ? 'a number' : issue.expected === 'int' ? 'a whole number' : issue.expected === 'string' ? 'text' : `a ${issue.expected}`}`;
    case 'too_small':
      if (issue.origin === 'string') return `${who} needs at least ${String(issue.minimum)} characters`;
      if (issue.origin === 'array' || issue.origin === 'set') return `${who} needs at least ${String(issue.minimum)} entries`;
      return `${who} must be ${issue.inclusive ? 'at least' : 'greater than'} ${String(issue.minimum)}`;
    case 'too_big':
      if (issue.origin === 'string') return `${who} is at most ${String(issue.maximum)} characters`;
      if (issue.origin === 'array' || issue.origin === 'set') return `${who} has at most ${String(issue.maximum)} entries`;
      return `${who} must be ${issue.inclusive ? 'at most' : 'less than'} ${String(issue.maximum)}`;
    case 'invalid_value':
      return `${who} must be one of: ${issue.values.map(String).join(', ')}`;
    case 'unrecognized_keys':
      return `${issue.keys.length === 1 ? 'Unknown field' : 'Unknown fields'} ${issue.keys.map((k) => `“${k}”`).join(', ')}`;
    case 'invalid_format':
      return `${who} is not in the expected form`;
    default:
      return `${who}: ${issue.message}`;
  }
}

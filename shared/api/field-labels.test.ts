import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { designInputSchema } from './designs';
import { fieldSentence, labelOf, wordIssue, wordMessage } from './field-labels';
import { releaseRequestSchema } from './growth';
import { moduleInputSchema } from './modules';

const issuesOf = (r: { success: boolean; error?: { issues: Parameters<typeof wordIssue>[0][] } }) => (r.error?.issues ?? []).map((i) => wordIssue(i));

describe('field labels in messages', () => {
  it('names a field by its label, its leg side included', () => {
    expect(labelOf('dueDate')).toBe('Due date');
    expect(labelOf('p.perCm3')).toBe('Doping n (p-type leg)');
    expect(labelOf('definition.minority.effectiveMass')).toBe('Minority effective mass');
    expect(labelOf('definition.effectiveMass')).toBe('Effective mass');
    expect(labelOf('definition.rows[3].seebeck')).toBeUndefined();
  });

  it('rewrites a leading key and keys inside the message, and an engine prefix', () => {
    expect(wordMessage('dueDate', 'dueDate must be a date like 2027-01-31')).toBe('Due date must be a date like 2027-01-31');
    expect(wordMessage('coldSide', 'coldSide must be below hotSide')).toBe('Cold-side target Tc must be below Hot-side temperature Th');
    expect(wordMessage('minPerCm3', 'bounds.minPerCm3: is below the lowest doping')).toBe('Lowest doping: is below the lowest doping');
    // A quoted value to type stays as written.
    expect(wordMessage('versus', 'versus must be "current" or "deltaT"')).toBe('versus must be "current" or "deltaT"');
    // Already in words: unchanged.
    expect(wordMessage('dueDate', 'Due date must be a date like 2027-01-31')).toBe('Due date must be a date like 2027-01-31');
  });

  it('words the schemas’ own messages and zod’s built-in ones by label', () => {
    const release = releaseRequestSchema.safeParse({ batch: '', dueDate: '31/01/2027', zones: 20, lossBudget: 'x' });
    expect(issuesOf(release)).toEqual(['Batch is required', 'Due date must be a date like 2027-01-31', 'Zones K must be 1–12', 'ΔT loss budget must be a number']);
    const module = moduleInputSchema.safeParse({ name: 'M', p: { kind: 'family', familyId: '00000000-0000-4000-8000-000000000001', perCm3: 2e25, lengthMm: 0, areaMm2: 1 }, n: { kind: 'run', runId: '00000000-0000-4000-8000-000000000002' }, hotSide: 50, deltaT: 30, colour: 'blue' });
    expect(issuesOf(module)).toEqual([
      'Doping n (p-type leg) must be at most 1e22 cm⁻³ (a value in m⁻³ is 10⁶ too large)',
      'Leg length L (p-type leg) must be greater than 0',
      'Hot-side temperature Th must be at least 100',
      'Unknown field “colour”',
    ]);
    const design = designInputSchema.safeParse({});
    for (const message of issuesOf(design)) expect(message).not.toMatch(/\b[a-z]+[A-Z]\w*\b|Invalid input|Too small/);
  });

  it('leaves no schema key at the start of any message the shared schemas write', () => {
    const dir = __dirname;
    const written = readdirSync(dir)
      .filter((f) => f.endsWith('.ts') && !f.endsWith('.test.ts'))
      .flatMap((f) => [...readFileSync(join(dir, f), 'utf8').matchAll(/error: '([a-z]\w*) ([^']*)'/g)].map((m) => ({ key: m[1], message: `${m[1]} ${m[2]}` })));
    expect(written.length).toBeGreaterThan(30);
    for (const { key, message } of written) {
      const worded = wordMessage(key, message);
      expect({ message, worded, keyLeft: worded.startsWith(`${key} `) && /[A-Z]/.test(key) }).toEqual({ message, worded, keyLeft: false });
    }
  });

  it('makes a sentence for a summary, keeping the path of a field without a label', () => {
    expect(fieldSentence('p.runId', 'no such run in this team')).toBe('Run (p-type leg): no such run in this team');
    expect(fieldSentence('dueDate', 'dueDate must be a date like 2027-01-31')).toBe('Due date must be a date like 2027-01-31');
    expect(fieldSentence('file', 'the file is empty')).toBe('The file is empty');
    expect(fieldSentence('definition.rows[3].seebeck', 'must have the same sign')).toBe('definition.rows[3].seebeck: must have the same sign');
    expect(fieldSentence('', 'the team is read-only')).toBe('The team is read-only');
  });
});

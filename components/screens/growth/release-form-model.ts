import { releaseRequestSchema, type ReleaseRequest } from '@/shared/api/growth';
import { wordIssue } from '@/shared/api/field-labels';

/** The release form as typed: every number still text. */
export type ReleaseDraft = { batch: string; dueDate: string; notes: string; zones: string; lossBudget: string; measureTemperature: string };

export const emptyRelease: ReleaseDraft = { batch: '', dueDate: '', notes: '', zones: '3', lossBudget: '1', measureTemperature: '300' };

export type ReleaseField = keyof ReleaseDraft;

const asNumber = (text: string) => (text.trim() === '' ? Number.NaN : Number(text.trim()));

/** The request, or a message for each field, checked with the API's own schema. */
export function checkRelease(d: ReleaseDraft): { ok: true; body: ReleaseRequest } | { ok: false; problems: Partial<Record<ReleaseField, string>> } {
  const body: ReleaseRequest = {
    batch: d.batch,
    dueDate: d.dueDate.trim() === '' ? undefined : d.dueDate.trim(),
    notes: d.notes,
    zones: asNumber(d.zones),
    lossBudget: asNumber(d.lossBudget),
    measureTemperature: asNumber(d.measureTemperature),
  };
  const parsed = releaseRequestSchema.safeParse(body);
  if (parsed.success) return { ok: true, body };
  const problems: Partial<Record<ReleaseField, string>> = {};
  for (const issue of parsed.error.issues) {
    const field = String(issue.path[0]) as ReleaseField;
    problems[field] ??= wordIssue(issue);
  }
  return { ok: false, problems };
}

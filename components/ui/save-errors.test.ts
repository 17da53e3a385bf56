import { ApiError } from '@/components/api/client';
import { saveErrors, splitFieldErrors } from './save-errors';

const shown = new Set(['name', 'lengthMm']);
const humanize = (field: string, message: string) => `${field} → ${message}`;
const split = (fieldErrors: Parameters<typeof splitFieldErrors>[0]) => splitFieldErrors(fieldErrors, shown, humanize);

describe('splitFieldErrors', () => {
  it('puts the first message of a shown field beside it and lists the rest', () => {
    const result = split([
      { field: 'name', message: 'taken' },
      { field: 'name', message: 'too long' },
      { field: 'definition', message: 'unknown key "colour"' },
      { field: '', message: 'the team is read-only' },
    ]);
    expect(result.byField).toEqual({ name: 'name → taken' });
    // Fields are named by their labels, and each message reads as a sentence.
    expect(result.other).toEqual(['Material definition: unknown key "colour"', 'The team is read-only']);
  });
});

describe('saveErrors', () => {
  it('is empty before a failed save', () => {
    expect(saveErrors(null, split)).toEqual({ byField: {}, other: [] });
  });

  it('keeps only the message of an error that did not come from the API', () => {
    expect(saveErrors(new Error('Network request failed'), split)).toEqual({ byField: {}, other: [], message: 'Network request failed' });
  });

  it('splits the field errors of an API refusal and keeps its message', () => {
    const error = new ApiError({ status: 400, name: 'ValidationError', message: 'Not valid.', fieldErrors: [{ field: 'lengthMm', message: 'too short' }] });
    expect(saveErrors(error, split)).toEqual({ byField: { lengthMm: 'lengthMm → too short' }, other: [], message: 'Not valid.' });
  });
});

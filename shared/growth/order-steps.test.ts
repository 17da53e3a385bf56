import { stepBlocker } from './order-steps';

describe('the grower\'s steps and what each needs', () => {
  it('measured needs an upload; growing needs a ready sheet; the other steps need nothing', () => {
    expect(stepBlocker('measured', { sheetStatus: 'ready', uploads: 0 })).toEqual({ field: 'measurements', message: expect.stringMatching(/upload the as-grown measurements first/) });
    expect(stepBlocker('measured', { sheetStatus: 'ready', uploads: 1 })).toBeNull();
    expect(stepBlocker('growing', { sheetStatus: 'computing', uploads: 0 })).toEqual({ field: 'sheet', message: expect.stringMatching(/still computing/) });
    expect(stepBlocker('growing', { sheetStatus: 'failed', uploads: 0 })?.message).toMatch(/failed/);
    expect(stepBlocker('growing', { sheetStatus: 'ready', uploads: 0 })).toBeNull();
    for (const next of ['accepted', 'grown'] as const) expect(stepBlocker(next, { sheetStatus: 'computing', uploads: 0 })).toBeNull();
  });
});

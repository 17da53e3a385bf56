import { safeNext } from './safe-next';

describe('safeNext', () => {
  it('keeps a path of the app', () => {
    expect(safeNext('/team')).toBe('/team');
    expect(safeNext('/materials/abc?tab=plots')).toBe('/materials/abc?tab=plots');
  });

  it('refuses other sites and odd values', () => {
    for (const value of ['//evil.example/x', 'https://evil.example', '/\\evil.example', 'team', '', undefined]) {
      expect(safeNext(value)).toBe('/');
    }
  });

  it('never loops back to a signed-out page', () => {
    expect(safeNext('/sign-in')).toBe('/');
    expect(safeNext('/sign-up?x=1')).toBe('/');
  });

  it('takes the first of repeated parameters', () => {
    expect(safeNext(['/outbox', '/team'])).toBe('/outbox');
  });
});

import { baseUrl, eventually, openBrowser, type BrowserSession } from './browser';

jest.setTimeout(120_000);

let session: BrowserSession;
beforeAll(async () => { session = await openBrowser(); });
afterAll(async () => { await session.close(); });

describe('the content security policy in the browser', () => {
  it('refuses injected inline script and eval, and the suites hear of it', async () => {
    const page = await session.newPage('desktop');
    const response = await page.goto(`${baseUrl}/sign-in`);
    expect(response?.headers()['content-security-policy']).toContain("script-src 'self' 'wasm-unsafe-eval'");
    await page.getByTestId('field-email').filter({ visible: true }).first().waitFor({ state: 'visible', timeout: 60_000 });

    // DevTools' own evaluation may eval whatever the policy says, so the
    // attempt runs later, from a timer of the page itself.
    await page.evaluate(() => {
      const script = document.createElement('script');
      script.textContent = 'window.__injected = true;';
      document.head.appendChild(script);
      setTimeout(() => {
        const w = window as unknown as { __evalRefused?: boolean };
        try {
          (0, eval)('1 + 1');
          w.__evalRefused = false;
        } catch (err) {
          w.__evalRefused = err instanceof EvalError;
        }
      }, 0);
    });
    await page.waitForFunction(() => (window as unknown as { __evalRefused?: boolean }).__evalRefused !== undefined);
    const outcome = await page.evaluate(() => {
      const w = window as unknown as { __injected?: boolean; __evalRefused?: boolean };
      return { injectedRan: w.__injected === true, evalRefused: w.__evalRefused };
    });
    expect(outcome).toEqual({ injectedRan: false, evalRefused: true });
    // The collector every suite checks saw both (the events arrive asynchronously).
    const seen = (what: string) => session.policyViolations.some((v) => v.includes(what));
    await eventually(async () => (seen('script-src-elem blocked inline') && seen('script-src blocked eval') ? true : undefined), 10, 'both violations to be reported');
    expect(session.pageErrors).toEqual([]);
  });
});

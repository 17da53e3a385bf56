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

    const outcome = await page.evaluate(() => {
      const script = document.createElement('script');
      script.textContent = 'window.__injected = true;';
      document.head.appendChild(script);
      let evalRefused = false;
      try {
        // The point: the policy must refuse it.
        (0, eval)('1 + 1');
      } catch (err) {
        evalRefused = err instanceof EvalError;
      }
      return { injectedRan: (window as unknown as { __injected?: boolean }).__injected === true, evalRefused };
    });
    expect(outcome).toEqual({ injectedRan: false, evalRefused: true });
    // The collector every suite checks saw both (the events arrive asynchronously).
    const seen = (what: string) => session.policyViolations.some((v) => v.includes(what));
    await eventually(async () => (seen('script-src-elem blocked inline') && seen('script-src blocked eval') ? true : undefined), 10, 'both violations to be reported');
    expect(session.pageErrors).toEqual([]);
  });
});

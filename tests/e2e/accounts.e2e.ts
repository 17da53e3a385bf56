import { request, type Page } from 'playwright-core';
import { familiesResponseSchema } from '../../shared/api/families';
import {
  baseUrl,
  getJsonAs,
  linkIn,
  openBrowser,
  pageProblems,
  postJsonAs,
  saveScreenshot,
  shellNav,
  signIn,
  signInAs,
  waitForCapturedMail,
  waitForMail,
  waitForVisibleText,
  type BrowserSession,
} from './browser';

jest.setTimeout(240_000);

const admin = 'ada@northlight.example';
const teamName = 'Northlight Sensors — detector cooling group';
/** Fresh addresses every run, so repeated runs never meet the sign-in limit of an old account. */
const run = Date.now().toString(36);
const fresh = (who: string) => `${who}-${run}@northlight.example`;

const visible = (page: Page, testId: string) => page.getByTestId(testId).filter({ visible: true });

/** An invited, accepted member with a known password, made through the API (no browser). */
async function makeMember(adminSession: BrowserSession, email: string, password: string): Promise<void> {
  await postJsonAs(adminSession, '/api/team/invitations', { email, role: 'viewer' });
  const token = new URL(linkIn((await waitForMail(adminSession, email, /invited to join a team/)).text, '/join')).searchParams.get('token');
  const api = await request.newContext();
  const answer = await api.post(`${baseUrl}/api/invitations/accept`, {
    data: { token, password, displayName: `Test ${email.split('@')[0]}` },
    headers: { Origin: baseUrl },
  });
  await api.dispose();
  if (answer.status() !== 201) throw new Error(`accepting the invitation answered ${answer.status()}`);
}

/** Signs in on a page and opens the growth list, which keeps a socket open (the server closes it when the session ends). */
async function signInToLivePage(page: Page, email: string, password: string): Promise<void> {
  await signIn(page, email, password);
  await page.goto(`${baseUrl}/growth`);
  await shellNav(page).waitFor({ state: 'visible', timeout: 30_000 });
}

describe('accounts in a real browser', () => {
  let adminSession: BrowserSession;

  beforeAll(async () => {
    adminSession = await openBrowser();
    await signInAs(adminSession, admin);
  });

  afterAll(async () => {
    await adminSession?.close();
  });

  it('an admin invites a grower, who joins through the e-mailed link and sees what a grower may', async () => {
    const grower = fresh('grower');
    const adminPage = await adminSession.newPage('desktop');
    await adminPage.goto(`${baseUrl}/team`);
    await visible(adminPage, 'invite-form').waitFor();
    await visible(adminPage, 'field-invite-email').fill(grower);
    await adminPage.getByRole('radio', { name: 'Grower' }).filter({ visible: true }).click();
    await visible(adminPage, 'send-invitation').click();
    await visible(adminPage, 'invite-sent').waitFor();
    await expectText(visible(adminPage, `invitation-${grower}`), /GROWER[\s\S]*Pending/);
    await saveScreenshot(adminPage, 'team-admin-desktop');

    const mail = await waitForMail(adminSession, grower, /invited to join a team/);
    const link = linkIn(mail.text, '/join');
    expect(link.startsWith(`${baseUrl}/join?token=`)).toBe(true);

    const newcomer = await openBrowser();
    try {
      const page = await newcomer.newPage('phone');
      await page.goto(link);
      const summary = visible(page, 'invitation-summary');
      await summary.waitFor();
      await expectText(summary, new RegExp(`${teamName}[\\s\\S]*GROWER[\\s\\S]*${grower}`));
      await saveScreenshot(page, 'join-phone');
      await visible(page, 'field-displayName').fill('Gus Newgrow');
      await visible(page, 'field-password').fill('a fresh grower passphrase');
      await visible(page, 'submit-join').click();

      await shellNav(page).waitFor({ state: 'visible', timeout: 30_000 });
      // A grower starts on her growth orders; Materials is one tab away.
      await page.waitForURL(`${baseUrl}/growth`);
      await page.getByRole('tab', { name: 'Materials' }).filter({ visible: true }).click();
      await page.waitForURL(`${baseUrl}/materials`);
      const families = familiesResponseSchema.parse(await getJsonAs(newcomer, '/api/families'));
      await waitForVisibleText(page, families.families[0].name);
      expect(await page.getByRole('tab', { name: 'Team' }).filter({ visible: true }).count()).toBe(1);
      expect(await page.getByRole('tab', { name: 'Outbox' }).count()).toBe(0);
      expect(await page.getByTestId('new-family').count()).toBe(0);
      expect(await page.getByTestId('upload-family').count()).toBe(0);
      await saveScreenshot(page, 'materials-grower-phone');

      await visible(page, 'account-menu-button').click();
      await expectText(visible(page, 'account-menu'), /Gus Newgrow[\s\S]*GROWER[\s\S]*Northlight/);
      await page.waitForTimeout(400); // the menu fades in
      await saveScreenshot(page, 'account-menu-phone');
    } finally {
      await newcomer.close();
    }

    await adminPage.reload();
    await expectText(visible(adminPage, `member-${grower}`), /Gus Newgrow[\s\S]*GROWER/);
    await expectText(visible(adminPage, `invitation-${grower}`), /Accepted/);
    await adminPage.close();

    // Removing asks first; "Keep" leaves the member in place.
    const phone = await adminSession.newPage('phone');
    await phone.goto(`${baseUrl}/team`);
    const row = visible(phone, `member-${grower}`);
    await row.getByRole('button', { name: 'Remove Gus Newgrow' }).click();
    await expectText(row.getByTestId('confirm-remove'), /Remove Gus Newgrow from the team\?/);
    await row.getByTestId('confirm-remove').scrollIntoViewIfNeeded();
    await saveScreenshot(phone, 'team-remove-confirm-phone');
    await row.getByTestId('cancel').click();
    expect(await row.getByTestId('confirm-remove').count()).toBe(0);
    await phone.close();
  });

  it('removing a member signs their open page out at once; the team list drops them', async () => {
    const member = fresh('leaving');
    const password = 'a leaving member passphrase';
    await makeMember(adminSession, member, password);
    const leaver = await openBrowser();
    try {
      const theirs = await leaver.newPage('phone');
      // The server closes its socket on removal.
      await signInToLivePage(theirs, member, password);

      const page = await adminSession.newPage('desktop');
      await page.goto(`${baseUrl}/team`);
      const row = visible(page, `member-${member}`);
      const name = `Test ${member.split('@')[0]}`;
      await row.getByRole('button', { name: `Remove ${name}` }).click();
      const confirm = row.getByTestId('confirm-remove');
      await expectText(confirm, /signed out everywhere at once[\s\S]*runs, releases, uploads and growth steps stay with the team under their name/);
      await confirm.scrollIntoViewIfNeeded();
      await saveScreenshot(page, 'team-remove-confirm-desktop');
      await confirm.getByTestId('confirm').click();
      await visible(page, `member-${member}`).waitFor({ state: 'detached', timeout: 15_000 });
      await page.close();

      await theirs.waitForURL(/\/sign-in/, { timeout: 15_000 });
      await saveScreenshot(theirs, 'removed-member-signed-out-phone');
      expect(pageProblems(leaver)).toEqual([]);
    } finally {
      await leaver.close();
    }
  });

  it('resets a password through the e-mailed link: the old one is refused, the new one works', async () => {
    const member = fresh('reset');
    const oldPassword = 'the first long passphrase';
    const newPassword = 'a second, newer passphrase';
    await makeMember(adminSession, member, oldPassword);

    const visitor = await openBrowser();
    try {
      const page = await visitor.newPage('phone');
      await page.goto(`${baseUrl}/sign-in`);
      await visible(page, 'link-forgot').click();
      await page.waitForURL(`${baseUrl}/forgot-password`);
      // The same words for an address without an account …
      await visible(page, 'field-email').fill(fresh('nobody'));
      await visible(page, 'submit-reset-request').click();
      const neutral = await visible(page, 'reset-requested').innerText();
      // … and for one with an account, asked afresh.
      await page.goto(`${baseUrl}/forgot-password`);
      await visible(page, 'field-email').fill(member);
      await visible(page, 'submit-reset-request').click();
      expect(await visible(page, 'reset-requested').innerText()).toBe(neutral);
      await waitForMail(adminSession, member, /Reset your Frostgrade password/);
      await saveScreenshot(page, 'forgot-password-phone');

      const link = linkIn((await waitForMail(adminSession, member, /Reset your/)).text, '/reset-password');
      expect(link.startsWith(`${baseUrl}/reset-password?token=`)).toBe(true);
      await page.goto(link);
      await visible(page, 'field-password').fill(newPassword);
      await saveScreenshot(page, 'reset-password-phone');
      await visible(page, 'submit-reset').click();
      await visible(page, 'reset-done').waitFor();

      await visible(page, 'link-sign-in').click();
      await page.waitForURL(/\/sign-in/);
      await visible(page, 'field-email').fill(member);
      await visible(page, 'field-password').fill(oldPassword);
      await visible(page, 'submit-sign-in').click();
      await expectText(visible(page, 'error-password'), /E-mail or password is wrong/);
      await saveScreenshot(page, 'sign-in-refused-phone');

      await visible(page, 'field-password').fill(newPassword);
      await visible(page, 'submit-sign-in').click();
      await shellNav(page).waitFor({ state: 'visible', timeout: 30_000 });

      // The link works once.
      await page.goto(link);
      await visible(page, 'field-password').fill('yet another passphrase');
      await visible(page, 'submit-reset').click();
      await expectText(visible(page, 'reset-problem'), /invalid, used or expired/);
    } finally {
      await visitor.close();
    }
  });

  it('signs out back to the sign-in page, on a desktop and on a phone', async () => {
    const member = fresh('leaver');
    const password = 'a passphrase for leaving';
    await makeMember(adminSession, member, password);
    const visitor = await openBrowser();
    try {
      const desktop = await visitor.newPage('desktop');
      await desktop.goto(`${baseUrl}/sign-in`);
      await desktop.getByRole('heading', { name: 'Sign in' }).filter({ visible: true }).waitFor();
      await saveScreenshot(desktop, 'sign-in-desktop');
      await signIn(desktop, member, password);
      await expectText(visible(desktop, 'account-panel'), /VIEWER[\s\S]*Northlight/);
      await desktop.getByRole('tab', { name: 'Team' }).filter({ visible: true }).click();
      await desktop.waitForURL(`${baseUrl}/team`);
      await visible(desktop, 'members').waitFor();
      await saveScreenshot(desktop, 'team-viewer-desktop');
      expect(await desktop.getByRole('button', { name: /^Change role of / }).count()).toBe(0);

      await visible(desktop, 'sign-out').click();
      await desktop.getByRole('heading', { name: 'Sign in' }).filter({ visible: true }).waitFor();
      expect(desktop.url()).toBe(`${baseUrl}/sign-in`);
      // Signed out means signed out: a deep link asks to sign in and remembers where it led.
      await desktop.goto(`${baseUrl}/team`);
      await desktop.waitForURL(/\/sign-in\?next=%2Fteam/);

      const phone = await visitor.newPage('phone');
      await signIn(phone, member, password);
      await saveScreenshot(phone, 'materials-viewer-phone');
      await visible(phone, 'account-menu-button').click();
      await visible(phone, 'sign-out').click();
      await phone.getByRole('heading', { name: 'Sign in' }).filter({ visible: true }).waitFor();
      await saveScreenshot(phone, 'sign-in-phone');
      expect(pageProblems(visitor)).toEqual([]);
    } finally {
      await visitor.close();
    }
  });

  it('starts a team from the sign-up page; its first member is the admin', async () => {
    const founder = `founder-${run}@lab.example`;
    const visitor = await openBrowser();
    try {
      for (const width of ['phone', 'desktop'] as const) {
        const page = await visitor.newPage(width);
        for (const [path, heading] of [['/sign-up', 'Start a team'], ['/forgot-password', 'Forgot your password?']] as const) {
          await page.goto(`${baseUrl}${path}`);
          await page.getByRole('heading', { name: heading }).filter({ visible: true }).waitFor();
          await saveScreenshot(page, `${path.slice(1)}-${width}`);
        }
        await page.close();
      }
      const page = await visitor.newPage('desktop');
      await page.goto(`${baseUrl}/sign-in`);
      await visible(page, 'link-sign-up').click();
      await page.waitForURL(`${baseUrl}/sign-up`);
      await visible(page, 'field-displayName').fill('Fern Founder');
      await visible(page, 'field-email').fill('not an address');
      await visible(page, 'field-teamName').fill(`Founders lab ${run}`);
      await visible(page, 'submit-sign-up').click();
      await expectText(visible(page, 'error-email'), /Not a valid address/);
      await visible(page, 'field-email').fill(founder);
      await visible(page, 'submit-sign-up').click();
      // Step one ends here, the same for every address: check your inbox.
      await expectText(visible(page, 'sign-up-requested'), new RegExp(`We sent an e-mail to ${founder}`));
      await saveScreenshot(page, 'sign-up-check-inbox-desktop');

      // The address belongs to no team yet, so no outbox shows it: read the catcher's table.
      const link = linkIn((await waitForCapturedMail(founder, /Finish creating your Frostgrade account/)).text, '/confirm-sign-up');
      expect(link.startsWith(`${baseUrl}/confirm-sign-up?token=`)).toBe(true);
      const phone = await visitor.newPage('phone');
      await phone.goto(link);
      await expectText(visible(phone, 'sign-up-summary'), new RegExp(`Founders lab ${run}[\\s\\S]*Fern Founder, admin[\\s\\S]*${founder}`));
      await saveScreenshot(phone, 'confirm-sign-up-phone');
      await phone.close();
      await page.goto(link);
      await visible(page, 'field-password').fill('short');
      await visible(page, 'submit-confirm-sign-up').click();
      await expectText(visible(page, 'error-password'), /at least 10 characters/);
      await saveScreenshot(page, 'confirm-sign-up-desktop');
      await visible(page, 'field-password').fill('a long enough founding phrase');
      await visible(page, 'submit-confirm-sign-up').click();

      await shellNav(page).waitFor({ state: 'visible', timeout: 30_000 });
      await expectText(visible(page, 'account-panel'), new RegExp(`Fern Founder[\\s\\S]*ADMIN[\\s\\S]*Founders lab ${run}`));
      await page.getByRole('tab', { name: 'Team' }).filter({ visible: true }).click();
      await expectText(visible(page, 'members'), /1 member,[\s\S]*Fern Founder · you[\s\S]*ADMIN/);
      expect(await page.getByRole('tab', { name: 'Outbox' }).filter({ visible: true }).count()).toBe(1);
      await saveScreenshot(page, 'team-founder-desktop');

      // The only admin cannot step down: the API's 409 is said in the row.
      await page.getByRole('button', { name: 'Change role of Fern Founder' }).click();
      await visible(page, 'role-editor').getByRole('radio', { name: 'Viewer' }).click();
      await visible(page, 'save-role').click();
      await expectText(visible(page, 'role-problem'), /The team needs at least one admin/);
      await visible(page, 'role-problem').scrollIntoViewIfNeeded();
      await saveScreenshot(page, 'team-last-admin-desktop');
      await expectText(visible(page, 'account-panel'), /ADMIN/);
    } finally {
      await visitor.close();
    }
  });

  it('changes the password on the account page and signs out everywhere; open pages elsewhere are signed out at once', async () => {
    const member = fresh('changer');
    const password = 'the changer first passphrase';
    const newPassword = 'the changer second passphrase';
    await makeMember(adminSession, member, password);
    const phoneBrowser = await openBrowser();
    const deskBrowser = await openBrowser();
    try {
      const phone = await phoneBrowser.newPage('phone');
      // The server closes its socket when the password changes.
      await signInToLivePage(phone, member, password);

      const desk = await deskBrowser.newPage('desktop');
      await signIn(desk, member, password);
      await visible(desk, 'open-account').click();
      await desk.waitForURL(`${baseUrl}/account`);
      await expectText(visible(desk, 'account-who'), new RegExp(`${member}[\\s\\S]*VIEWER`));
      await visible(desk, 'field-currentPassword').fill('not the password at all');
      await visible(desk, 'field-newPassword').fill(newPassword);
      await visible(desk, 'submit-password').click();
      await expectText(visible(desk, 'error-currentPassword'), /This is not your current password/);
      await visible(desk, 'field-currentPassword').fill(password);
      await visible(desk, 'submit-password').click();
      await expectText(visible(desk, 'password-changed'), /Every other session of your account was signed out; this one stays/);
      await saveScreenshot(desk, 'account-password-changed-desktop');
      await waitForMail(adminSession, member, /Your Frostgrade password was changed/);

      // The phone's session ended; its open page goes to sign-in by itself.
      await phone.waitForURL(/\/sign-in/, { timeout: 15_000 });
      await signIn(phone, member, newPassword);
      await desk.goto(`${baseUrl}/growth`);
      await shellNav(desk).waitFor({ state: 'visible', timeout: 30_000 });
      await visible(phone, 'account-menu-button').click();
      await visible(phone, 'open-account').click();
      await phone.waitForURL(`${baseUrl}/account`);
      await visible(phone, 'ask-sign-out-everywhere').click();
      await expectText(visible(phone, 'confirm-sign-out-everywhere'), /Every session of your account ends at once, this one too/);
      await visible(phone, 'confirm-sign-out-everywhere').scrollIntoViewIfNeeded();
      await saveScreenshot(phone, 'account-sign-out-everywhere-phone');
      await visible(phone, 'confirm-sign-out-everywhere').getByTestId('confirm').click();
      await phone.getByRole('heading', { name: 'Sign in' }).filter({ visible: true }).waitFor();
      // …and the desktop, signed in elsewhere, is signed out by the server at once.
      await desk.waitForURL(/\/sign-in/, { timeout: 15_000 });
      expect(phoneBrowser.pageErrors).toEqual([]);
      expect(deskBrowser.pageErrors).toEqual([]);
    } finally {
      await phoneBrowser.close();
      await deskBrowser.close();
    }
  });

  it('shows admins the audit trail, on a desktop and on a phone, and exports it as CSV', async () => {
    const desk = await adminSession.newPage('desktop');
    await desk.goto(`${baseUrl}/team`);
    await visible(desk, 'open-audit').click();
    await desk.waitForURL(`${baseUrl}/team/audit`);
    // Earlier tests invited members and changed passwords in this team.
    await expectText(visible(desk, 'audit-list'), /INVITED[\s\S]*Ada Lindqvist invited/);
    await expectText(visible(desk, 'audit-list'), /PASSWORD CHANGED/);
    await saveScreenshot(desk, 'audit-desktop');
    const href = await visible(desk, 'audit-csv').getAttribute('href');
    expect(href).toMatch(/\/api\/audit\/export\.csv$/);
    const csv = await adminSession.context.request.get(`${baseUrl}/api/audit/export.csv`);
    expect(csv.status()).toBe(200);
    expect((await csv.text()).split(/\r?\n/)[0]).toBe('at_utc,action,actor,actor_id,email,subject_id,summary,ip');
    await desk.close();

    const phone = await adminSession.newPage('phone');
    await phone.goto(`${baseUrl}/team/audit`);
    await expectText(visible(phone, 'audit-list'), /INVITED/);
    await saveScreenshot(phone, 'audit-phone');
    await phone.close();
  });

  it('raised no uncaught errors in the admin pages', () => {
    expect(pageProblems(adminSession)).toEqual([]);
  });
});

/** Waits until the element's text matches (it may still be loading). */
async function expectText(locator: ReturnType<Page['getByTestId']>, pattern: RegExp): Promise<void> {
  const deadline = Date.now() + 20_000;
  let text = '';
  while (Date.now() < deadline) {
    if ((await locator.count()) > 0) {
      text = await locator.first().innerText();
      if (pattern.test(text)) return;
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new Error(`expected ${pattern} in: ${text || '(element not found)'}`);
}

// Browser end-to-end for people: an owner invites a new address from the members page, resends and
// withdraws invitations, and the invitee joins through the mailed link; a forgotten password is
// reset through the mailed link; the account page changes one's name; the owner reads the audit
// trail; the site administrator disables an account. Mail goes to the SMTP fake.
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startStack, type Stack } from '../support/stack';
import { launchChromium, saveScreenshot } from './support/chromium';
import { freshPage } from './support/fresh-page';
import { mailedLink } from './support/mail-link';
import { DEMO_PASSWORD, signIn } from './support/sign-in';

const PROJECT = 'Atoms & Bonds — Chapter 4: The Hydrogen Atom';
const INVITEE = 'noor.haddad@example.org';
const INVITEE_PASSWORD = 'noor-chooses-a-password';
const NEW_PASSWORD = 'ravi-new-password-2026';

describe('invitations, password reset, account page, audit trail and user list', () => {
  let stack: Stack;
  let browser: Browser;
  let problems: string[];

  const newPage = () => freshPage(browser, problems);

  async function openTab(page: Page, name: string): Promise<void> {
    await page.getByRole('navigation', { name: 'Project' }).getByRole('link', { name }).click();
  }

  beforeAll(async () => {
    stack = await startStack({ mail: true });
    browser = await launchChromium();
    problems = [];
  });

  afterAll(async () => {
    await browser?.close();
    await stack?.stop();
  });

  let owner: Page;
  let invitationPath: string;

  it('when the owner invites a new address from the members page, then it is listed as waiting and a link is mailed', async () => {
    owner = await newPage();
    await signIn(owner, stack.baseUrl, 'ada.okafor@harrowgate.example');
    await owner.getByRole('link', { name: PROJECT }).click();
    await openTab(owner, 'Members');
    const form = owner.getByRole('form', { name: 'Invite by e-mail' });
    await form.getByLabel('E-mail').fill(INVITEE);
    await form.getByLabel('Role').selectOption('editor');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await owner.getByText(`Invitation sent to ${INVITEE} as editor`).waitFor();
    const waiting = owner.getByRole('table', { name: 'Invitations waiting for an answer' });
    await waiting.getByRole('rowheader', { name: INVITEE }).waitFor();
    expect(await waiting.getByRole('row', { name: new RegExp(INVITEE) }).textContent()).toContain(
      'expires in 7 days',
    );
    invitationPath = await mailedLink(stack.mail!, INVITEE, '/invitations/accept');
    await saveScreenshot(owner, 'people-members-invitations');
  });

  it('when the owner invites an existing member, then the e-mail field says they are a member', async () => {
    const form = owner.getByRole('form', { name: 'Invite by e-mail' });
    await form.getByLabel('E-mail').fill('ravi.mendes@harrowgate.example');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await owner.getByText('Ravi Mendes is already a member of this project').waitFor();
    expect(await form.getByLabel('E-mail').getAttribute('aria-invalid')).toBe('true');
  });

  it('when the owner withdraws an invitation, then it leaves the list and its link says so', async () => {
    const form = owner.getByRole('form', { name: 'Invite by e-mail' });
    await form.getByLabel('E-mail').fill('someone.else@example.org');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await owner.getByRole('rowheader', { name: 'someone.else@example.org' }).waitFor();
    const withdrawnPath = await mailedLink(stack.mail!, 'someone.else@example.org', '/invitations/accept');

    await owner.getByRole('button', { name: 'Withdraw the invitation of someone.else@example.org' }).click();
    const dialog = owner.getByRole('dialog', { name: 'Withdraw the invitation of someone.else@example.org?' });
    await dialog.getByRole('button', { name: 'Withdraw' }).click();
    await owner.getByRole('rowheader', { name: 'someone.else@example.org' }).waitFor({ state: 'detached' });

    const stranger = await newPage();
    await stranger.goto(`${stack.baseUrl}${withdrawnPath}`);
    await stranger.getByText('This invitation was withdrawn').waitFor();
    await stranger.context().close();
  });

  it('when the owner resends an invitation, then a new link is mailed and the old one stops working', async () => {
    const before = stack.mail!.messages.length;
    await owner.getByRole('button', { name: `Resend the invitation of ${INVITEE}` }).click();
    await owner.getByText(`A new link was sent to ${INVITEE}.`).waitFor();
    const oldPath = invitationPath;
    invitationPath = await mailedLink(stack.mail!, INVITEE, '/invitations/accept', before);
    expect(invitationPath).not.toBe(oldPath);

    const stranger = await newPage();
    await stranger.goto(`${stack.baseUrl}${oldPath}`);
    await stranger.getByText('This invitation link does not work').waitFor();
    await stranger.context().close();
  });

  let invitee: Page;

  it('when the invitee opens the mailed link, creates the account and joins, then the project opens', async () => {
    invitee = await newPage();
    await invitee.goto(`${stack.baseUrl}${invitationPath}`);
    await invitee.getByRole('heading', { level: 1, name: 'Join a project' }).waitFor();
    await invitee.getByText(`Ada Okafor invited ${INVITEE} to join ${PROJECT} as editor.`).waitFor();
    const form = invitee.getByRole('form', { name: 'Create your account' });
    expect(await form.getByLabel('E-mail').inputValue()).toBe(INVITEE);
    await form.getByLabel('Your name').fill('Noor Haddad');
    await form.getByLabel('Password').fill('short');
    await form.getByRole('button', { name: 'Create account and join' }).click();
    await invitee.getByText('Must be at least 10 characters').waitFor();
    await saveScreenshot(invitee, 'people-accept-invitation');

    await form.getByLabel('Password').fill(INVITEE_PASSWORD);
    await form.getByRole('button', { name: 'Create account and join' }).click();
    await invitee.getByRole('heading', { level: 1, name: PROJECT }).waitFor();
    await invitee.getByRole('table', { name: /Figures in this project/ }).waitFor();
    await invitee.getByText('Noor Haddad', { exact: true }).waitFor();
    await saveScreenshot(invitee, 'people-invitee-in-project');
  });

  it('when the used link is opened again, then it says the invitation was already accepted', async () => {
    await invitee.goto(`${stack.baseUrl}${invitationPath}`);
    await invitee.getByText('This invitation has already been accepted').waitFor();
  });

  it('when the owner opens the audit trail, then the invitation and the joining are listed, newest first', async () => {
    await owner.reload();
    await owner.getByRole('rowheader', { name: 'Noor Haddad' }).waitFor();
    expect(await owner.getByRole('rowheader', { name: INVITEE }).count()).toBe(0);
    await openTab(owner, 'Audit');
    const trail = owner.getByRole('table', { name: 'Changes to this project, newest first' });
    await trail.waitFor();
    const rows = await trail.getByRole('row').allTextContents();
    const joined = rows.findIndex((r) => r.includes('Noor Haddad joined as editor'));
    const invited = rows.findIndex((r) => r.includes(`Invited ${INVITEE} as editor`));
    expect(joined).toBeGreaterThan(0);
    expect(invited).toBeGreaterThan(joined);
    await owner.getByLabel('Show').selectOption('figures');
    expect(await trail.getByText(/joined as editor/).count()).toBe(0);
    await owner.getByLabel('Show').selectOption('people');
    await saveScreenshot(owner, 'people-audit-trail');
  });

  it('when a viewer opens the project, then there is no Audit tab', async () => {
    const viewer = await newPage();
    await signIn(viewer, stack.baseUrl, 'tomas.reyes@fennwick.example');
    await viewer.getByRole('link', { name: PROJECT }).click();
    await viewer.getByRole('navigation', { name: 'Project' }).getByRole('link', { name: 'Members' }).waitFor();
    expect(await viewer.getByRole('navigation', { name: 'Project' }).getByRole('link', { name: 'Audit' }).count()).toBe(0);
    expect(await viewer.getByRole('form', { name: 'Invite by e-mail' }).count()).toBe(0);
    await viewer.context().close();
  });

  let ravi: Page;
  let resetPath: string;

  it('when someone forgot the password, then the mailed link sets a new one and signs them in', async () => {
    ravi = await newPage();
    await ravi.goto(`${stack.baseUrl}/sign-in`);
    await ravi.getByRole('link', { name: 'Forgot password?' }).click();
    await ravi.getByRole('heading', { level: 1, name: 'Forgot your password?' }).waitFor();
    await ravi.getByLabel('E-mail').fill('ravi.mendes@harrowgate.example');
    await ravi.getByRole('button', { name: 'Send reset link' }).click();
    await ravi.getByText('a link to choose a new password is on its way').waitFor();
    await saveScreenshot(ravi, 'people-forgot-password');

    resetPath = await mailedLink(stack.mail!, 'ravi.mendes@harrowgate.example', '/reset-password');
    await ravi.goto(`${stack.baseUrl}${resetPath}`);
    await ravi.getByRole('heading', { level: 1, name: 'Choose a new password' }).waitFor();
    await ravi.getByLabel('New password', { exact: true }).fill(NEW_PASSWORD);
    await ravi.getByRole('button', { name: 'Save new password' }).click();
    await ravi.getByRole('heading', { level: 1, name: 'Projects' }).waitFor();
    await ravi.getByText('Ravi Mendes', { exact: true }).waitFor();
  });

  it('when the reset link is used again, then it is refused and a new one is offered', async () => {
    const other = await newPage();
    await other.goto(`${stack.baseUrl}${resetPath}`);
    await other.getByLabel('New password', { exact: true }).fill('yet-another-password');
    await other.getByRole('button', { name: 'Save new password' }).click();
    await other.getByText('This link does not work').waitFor();
    await other.getByRole('link', { name: 'Ask for a new link' }).waitFor();
    await saveScreenshot(other, 'people-reset-link-used');

    // The old password no longer works; the new one does.
    await other.goto(`${stack.baseUrl}/sign-in`);
    await other.getByLabel('E-mail').fill('ravi.mendes@harrowgate.example');
    await other.getByLabel('Password').fill(DEMO_PASSWORD);
    await other.getByRole('button', { name: 'Sign in' }).click();
    await other.getByText('E-mail address or password is wrong').waitFor();
    await other.getByLabel('Password').fill(NEW_PASSWORD);
    await other.getByRole('button', { name: 'Sign in' }).click();
    await other.getByRole('heading', { level: 1, name: 'Projects' }).waitFor();
    await other.context().close();
  });

  it('when the account page changes the name, then the header shows the new name', async () => {
    await ravi.getByRole('link', { name: 'Account' }).click();
    await ravi.getByRole('heading', { level: 1, name: 'Your account' }).waitFor();
    const form = ravi.getByRole('form', { name: 'Your name' });
    await form.getByLabel('Name').fill('Ravi Mendes-Costa');
    await form.getByRole('button', { name: 'Save name' }).click();
    await ravi.getByText('Your name is now Ravi Mendes-Costa.').waitFor();
    await ravi.getByRole('banner').getByText('Ravi Mendes-Costa', { exact: true }).waitFor();
    await ravi.reload();
    expect(await ravi.getByRole('form', { name: 'Your name' }).getByLabel('Name').inputValue()).toBe(
      'Ravi Mendes-Costa',
    );
    await saveScreenshot(ravi, 'people-account');
  });

  it('when the current password is wrong on the account page, then that field says so', async () => {
    const form = ravi.getByRole('form', { name: 'Change password' });
    await form.getByLabel('Current password').fill('not-my-password');
    await form.getByLabel('New password').fill('another-long-password');
    await form.getByRole('button', { name: 'Change password' }).click();
    await form.getByText('Not your current password').waitFor();
    expect(await form.getByLabel('Current password').getAttribute('aria-invalid')).toBe('true');
  });

  it('when the site administrator disables an account, then the user list marks it', async () => {
    const admin = await newPage();
    await signIn(admin, stack.baseUrl, 'admin@lobewright.example');
    await admin.getByRole('link', { name: 'Site settings' }).click();
    const users = admin.getByRole('table', { name: 'Accounts on this site' });
    await users.getByRole('rowheader', { name: /Noor Haddad/ }).waitFor();
    await admin.getByRole('button', { name: 'Disable Tomás Reyes' }).click();
    await admin.getByRole('dialog', { name: 'Disable Tomás Reyes?' }).getByRole('button', { name: 'Disable' }).click();
    await admin.getByRole('button', { name: 'Enable Tomás Reyes' }).waitFor();
    await admin.getByLabel('Find an account').fill('tomas');
    expect(await users.getByRole('rowheader').allTextContents()).toEqual(['Tomás ReyesDisabled']);
    await admin.getByLabel('Find an account').fill('');
    await saveScreenshot(admin, 'people-admin-users');
  });

  it('then no page error or server failure happened', () => {
    expect(problems).toEqual([]);
  });
});

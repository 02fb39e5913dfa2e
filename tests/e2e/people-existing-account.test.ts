// Browser end-to-end for people with accounts already: an invitation to an existing account asks
// whoever else is signed in to sign out, then to sign in as the invited account, and comes back to
// the link; an e-mail change takes effect through the link mailed to the new address; the figure's
// revision list says which fields each revision changed. Mail goes to the SMTP fake.
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startStack, type Stack } from '../support/stack';
import { launchChromium, saveScreenshot } from './support/chromium';
import { freshPage } from './support/fresh-page';
import { mailedLink } from './support/mail-link';
import { DEMO_PASSWORD, signIn } from './support/sign-in';

const PROJECT = 'Atoms & Bonds — Chapter 4: The Hydrogen Atom';
const ADMIN = 'admin@lobewright.example';
const NEW_ADDRESS = 'morgan.hale@example.org';

describe('invitations to existing accounts, e-mail change and revision changes', () => {
  let stack: Stack;
  let browser: Browser;
  let problems: string[];

  const newPage = () => freshPage(browser, problems);

  beforeAll(async () => {
    stack = await startStack({ mail: true });
    browser = await launchChromium();
    problems = [];
  });

  afterAll(async () => {
    await browser?.close();
    await stack?.stop();
  });

  let invitationPath: string;

  it('when the owner invites an address that has an account, then a link is mailed to it', async () => {
    const owner = await newPage();
    await signIn(owner, stack.baseUrl, 'ada.okafor@harrowgate.example');
    await owner.getByRole('link', { name: PROJECT }).click();
    await owner.getByRole('navigation', { name: 'Project' }).getByRole('link', { name: 'Members' }).click();
    const form = owner.getByRole('form', { name: 'Invite by e-mail' });
    await form.getByLabel('E-mail').fill(ADMIN);
    await form.getByLabel('Role').selectOption('reviewer');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await owner.getByRole('rowheader', { name: ADMIN }).waitFor();
    invitationPath = await mailedLink(stack.mail!, ADMIN, '/invitations/accept');
    await owner.context().close();
  });

  let page: Page;

  it('when someone else is signed in on the browser, then the page asks them to sign out first', async () => {
    page = await newPage();
    await signIn(page, stack.baseUrl, 'ravi.mendes@harrowgate.example');
    await page.goto(`${stack.baseUrl}${invitationPath}`);
    await page
      .getByText(`You are signed in as ravi.mendes@harrowgate.example, but this invitation is for ${ADMIN}.`)
      .waitFor();
    await saveScreenshot(page, 'people-accept-wrong-account');
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('link', { name: 'Sign in to accept' }).waitFor();
  });

  it('when the invited account signs in from the link, then it comes back and joins the project', async () => {
    await page.getByRole('link', { name: 'Sign in to accept' }).click();
    await page.getByLabel('E-mail').fill(ADMIN);
    await page.getByLabel('Password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('button', { name: `Join ${PROJECT}` }).click();
    await page.getByRole('heading', { level: 1, name: PROJECT }).waitFor();
    expect(new URL(page.url()).pathname).toMatch(/^\/projects\/\d+$/);
  });

  it('when the e-mail is changed on the account page, then it changes once the mailed link is opened', async () => {
    await page.getByRole('link', { name: 'Account' }).click();
    const form = page.getByRole('form', { name: 'Change e-mail' });
    await form.getByLabel('New e-mail').fill(NEW_ADDRESS);
    await form.getByLabel('Current password').fill(DEMO_PASSWORD);
    await form.getByRole('button', { name: 'Send confirmation link' }).click();
    await page.getByText(`A confirmation link was sent to ${NEW_ADDRESS}.`).waitFor();
    await form.getByText(`You sign in with ${ADMIN}.`).waitFor();

    const confirmPath = await mailedLink(stack.mail!, NEW_ADDRESS, '/confirm-email');
    await page.goto(`${stack.baseUrl}${confirmPath}`);
    await page.getByText(`Your e-mail is now ${NEW_ADDRESS}.`).waitFor();
    await saveScreenshot(page, 'people-confirm-email');

    await page.goto(`${stack.baseUrl}${confirmPath}`);
    await page.getByText('This link does not work').waitFor();
    await page.getByRole('link', { name: 'Go to your account' }).click();
    await page.getByRole('form', { name: 'Change e-mail' }).getByText(`You sign in with ${NEW_ADDRESS}.`).waitFor();
  });

  it('when an editor changes a figure’s title, then its revision says it changed the title', async () => {
    const editor = await newPage();
    await signIn(editor, stack.baseUrl, 'ravi.mendes@harrowgate.example');
    await editor.getByRole('link', { name: PROJECT }).click();
    await editor.getByRole('link', { name: 'The 1s orbital', exact: true }).click();
    await editor.getByLabel('Title').fill('The 1s orbital, once more');
    await editor.getByRole('button', { name: 'Save as new revision' }).click();
    const revisions = editor.getByRole('region', { name: 'Revisions' });
    await revisions.getByRole('cell', { name: 'changed: title', exact: true }).waitFor();
    await revisions.getByRole('cell', { name: 'first revision', exact: true }).waitFor();
    await saveScreenshot(editor, 'people-revision-changes');
  });

  it('then no page error or server failure happened', () => {
    expect(problems).toEqual([]);
  });
});

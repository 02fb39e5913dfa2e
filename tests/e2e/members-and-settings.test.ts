// Browser end-to-end: what each role may do is what the page offers. A viewer reads; the owner
// manages members (the last owner cannot be demoted), sets the house style, and the site
// administrator closes sign-up.
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startStack } from '../support/stack';
import { launchChromium, saveScreenshot, watchForProblems } from './support/chromium';
import { signIn } from './support/sign-in';

const PROJECT = 'Atoms & Bonds — Chapter 4: The Hydrogen Atom';

describe('roles, members, house style and site settings', () => {
  let stack: Awaited<ReturnType<typeof startStack>>;
  let browser: Browser;
  // One live list per page: problems reported after a page opens are collected too.
  let watched: string[][];

  async function pageFor(email: string): Promise<Page> {
    const page = await (
      await browser.newContext({ viewport: { width: 1280, height: 1000 } })
    ).newPage();
    watched.push(watchForProblems(page));
    await signIn(page, stack.baseUrl, email);
    return page;
  }

  beforeAll(async () => {
    stack = await startStack();
    browser = await launchChromium();
    watched = [];
  });

  afterAll(async () => {
    await browser?.close();
    await stack?.stop();
  });

  it('when a viewer opens the project, then nothing offers a change', async () => {
    const viewer = await pageFor('tomas.reyes@fennwick.example');
    await viewer.getByRole('link', { name: PROJECT }).click();
    await viewer.getByRole('table', { name: /Figures in this project/ }).waitFor();
    expect(await viewer.getByRole('button', { name: 'New figure' }).count()).toBe(0);

    await viewer.getByRole('link', { name: 'The 1s orbital', exact: true }).click();
    await viewer.getByText('Only editors and owners can change figures.').waitFor();
    expect(await viewer.getByRole('textbox').count()).toBe(0);
    expect(await viewer.getByRole('button', { name: /Delete|Duplicate/ }).count()).toBe(0);

    await viewer.goBack();
    await viewer
      .getByRole('navigation', { name: 'Project' })
      .getByRole('link', { name: 'Members' })
      .click();
    await viewer.getByRole('table', { name: /Project members/ }).waitFor();
    expect(await viewer.getByRole('combobox').count()).toBe(0);
    expect(await viewer.getByRole('button', { name: /Remove/ }).count()).toBe(0);

    await viewer
      .getByRole('navigation', { name: 'Project' })
      .getByRole('link', { name: 'Settings' })
      .click();
    await viewer.getByText('Only the project’s owners can change the house style.').waitFor();
    expect(await viewer.getByRole('button', { name: 'Save house style' }).count()).toBe(0);
  });

  let owner: Page;

  it('when the owner changes a role, then the member list shows it after a reload', async () => {
    owner = await pageFor('ada.okafor@harrowgate.example');
    await owner.getByRole('link', { name: PROJECT }).click();
    await owner
      .getByRole('navigation', { name: 'Project' })
      .getByRole('link', { name: 'Members' })
      .click();
    await owner.getByLabel('Role of Tomás Reyes').selectOption('reviewer');
    await owner.waitForResponse((r) => r.request().method() === 'PATCH' && r.ok());
    await owner.reload();
    await expect(owner.getByLabel('Role of Tomás Reyes').inputValue()).resolves.toBe('reviewer');
  });

  it('when the only owner demotes themselves, then the server refuses and the page says why', async () => {
    await owner.getByLabel('Role of Ada Okafor').selectOption('editor');
    const alert = owner.getByRole('alert');
    await alert.waitFor();
    expect((await alert.textContent())?.toLowerCase()).toContain('owner');
    await owner.waitForFunction(() => {
      const select = document.querySelector<HTMLSelectElement>(
        'select[aria-label="Role of Ada Okafor"]',
      );
      return select?.value === 'owner';
    });
  });

  it('when the owner adds an address without an account, then the e-mail field says so', async () => {
    await owner
      .getByRole('form', { name: 'Add a member' })
      .getByLabel('E-mail')
      .fill('nobody@example.org');
    await owner.getByRole('button', { name: 'Add member' }).click();
    const email = owner.getByRole('form', { name: 'Add a member' }).getByLabel('E-mail');
    await owner.waitForFunction(
      () =>
        document
          .querySelector('form[aria-label="Add a member"] input[type="email"]')
          ?.getAttribute('aria-invalid') === 'true',
    );
    expect(await email.getAttribute('aria-invalid')).toBe('true');
  });

  it('when the owner removes a member after confirming, then they leave the list', async () => {
    await owner.getByRole('button', { name: 'Remove Lena Brandt' }).click();
    const dialog = owner.getByRole('dialog', { name: 'Remove Lena Brandt?' });
    await dialog.getByRole('button', { name: 'Remove' }).click();
    await owner.getByRole('rowheader', { name: 'Lena Brandt' }).waitFor({ state: 'detached' });
    await saveScreenshot(owner, 'members-owner');
  });

  it('when the owner saves the house style, then a bad number is named and a good one is used by figures', async () => {
    await owner
      .getByRole('navigation', { name: 'Project' })
      .getByRole('link', { name: 'Settings' })
      .click();
    const form = owner.getByRole('form', { name: 'House style' });
    await form.getByLabel('Resolution (dpi)').fill('');
    await form.getByRole('button', { name: 'Save house style' }).click();
    await form.getByText('Enter a number').waitFor();

    await form.getByLabel('Resolution (dpi)').fill('600');
    await form.getByRole('button', { name: /Double column/ }).click();
    await form.getByRole('button', { name: 'Save house style' }).click();
    await form.getByRole('status').filter({ hasText: 'House style saved.' }).waitFor();
    await saveScreenshot(owner, 'house-style');

    await owner
      .getByRole('navigation', { name: 'Project' })
      .getByRole('link', { name: 'Figures' })
      .click();
    await owner.getByRole('link', { name: 'The 1s orbital', exact: true }).click();
    const summary = owner.getByRole('region', { name: 'What the figure shows' });
    await summary
      .getByText(
        /^174 × 84 mm, 600 dpi, transparent background, PNG \+ PDF \(all from the house style\)$/,
      )
      .waitFor();
  });

  it('when the administrator closes sign-up, then the sign-in page no longer offers it', async () => {
    const admin = await pageFor('admin@lobewright.example');
    await admin
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Site settings' })
      .click();
    const toggle = admin.getByRole('switch', { name: 'Anyone may create an account' });
    await expect(toggle.getAttribute('aria-checked')).resolves.toBe('true');
    await toggle.click();
    await admin.waitForFunction(
      () => document.querySelector('[role="switch"]')?.getAttribute('aria-checked') === 'false',
    );
    await admin.getByRole('button', { name: 'Sign out' }).click();
    await admin.waitForURL('**/sign-in');
    await admin.getByText('Accounts are created by your site administrator.').waitFor();
    expect(await admin.getByRole('link', { name: 'Create an account' }).count()).toBe(0);
    expect(watched.flat()).toEqual([]);
  });
});

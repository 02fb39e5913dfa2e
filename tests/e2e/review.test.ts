// Browser end-to-end: the demo reviewer opens figure 4.3 (in review), comments on it and approves
// its current revision; the editor then finds the figure approved, at that revision, in the figure
// table and on the figure page, with the comment and the status change kept with who and when.
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startStack } from '../support/stack';
import { launchChromium, saveScreenshot, watchForProblems } from './support/chromium';
import { signIn } from './support/sign-in';

const PROJECT = 'Atoms & Bonds — Chapter 4: The Hydrogen Atom';
const FIGURE = 'The 2p_z orbital';
const COMMENT = 'The nodal plane reads well from the side. Fine for print.';

async function openProject(page: Page, baseUrl: string, email: string): Promise<void> {
  await signIn(page, baseUrl, email);
  await page.getByRole('link', { name: PROJECT }).click();
  await page.getByRole('heading', { level: 1, name: PROJECT }).waitFor();
}

describe('a reviewer approves a figure and the editor sees it', () => {
  let stack: Awaited<ReturnType<typeof startStack>>;
  let browser: Browser;
  let lena: Page;
  let ravi: Page;
  let problems: string[];

  beforeAll(async () => {
    stack = await startStack();
    browser = await launchChromium();
    const viewport = { width: 1280, height: 1000 };
    lena = await (await browser.newContext({ viewport })).newPage();
    ravi = await (await browser.newContext({ viewport })).newPage();
    problems = [...watchForProblems(lena), ...watchForProblems(ravi)];
  });

  afterAll(async () => {
    await browser?.close();
    await stack?.stop();
  });

  it('when the reviewer opens figure 4.3, then the review shows it in review with the actions a reviewer has', async () => {
    await openProject(lena, stack.baseUrl, 'lena.brandt@fennwick.example');
    await lena.getByRole('link', { name: FIGURE, exact: true }).click();
    await lena.getByRole('heading', { level: 1, name: new RegExp(FIGURE) }).waitFor();
    const review = lena.getByRole('region', { name: 'Review', exact: true });
    await review.getByText('In review', { exact: true }).waitFor();
    await review.getByRole('button', { name: 'Approve revision 2' }).waitFor();
    await review.getByRole('button', { name: 'Request changes' }).waitFor();
    expect(await review.getByRole('button', { name: 'Submit for review' }).count()).toBe(0);
  });

  it('when she asks for changes without a note, then the note field says what is missing and nothing changes', async () => {
    const review = lena.getByRole('region', { name: 'Review', exact: true });
    await review.getByRole('button', { name: 'Request changes' }).click();
    const note = review.getByLabel('Note with the status change');
    expect(await note.getAttribute('aria-invalid')).toBe('true');
    await review.getByText('Say what should change', { exact: true }).waitFor();
    await review.getByText('In review', { exact: true }).waitFor();
  });

  it('when she comments, then the comment is listed under revision 2 (current) with her name', async () => {
    const review = lena.getByRole('region', { name: 'Review', exact: true });
    await review.getByLabel('Comment on revision 2').fill(COMMENT);
    await review.getByRole('button', { name: 'Post comment' }).click();
    const thread = review.getByRole('region', { name: 'Comments on revision 2' });
    await thread.getByText(COMMENT).waitFor();
    await thread.getByRole('article', { name: 'Comment by Lena Brandt' }).waitFor();
    expect(await review.getByLabel('Comment on revision 2').inputValue()).toBe('');
  });

  it('when she approves revision 2, then the status, the page header and the history say so', async () => {
    const review = lena.getByRole('region', { name: 'Review', exact: true });
    await review.getByRole('button', { name: 'Approve revision 2' }).click();
    await review.getByText('Approved.', { exact: true }).waitFor();
    await review.getByText('Approved revision: 2').waitFor();
    const history = review.getByRole('table', { name: /Status history/ });
    const row = history.getByRole('row', { name: /Lena Brandt/ });
    expect((await row.getByRole('cell').allTextContents()).slice(1)).toEqual([
      'In review → to Approved',
      '2',
      '—',
    ]);
    // The page header reads the same cached figure, so it changes with the panel.
    await lena.getByText('Approved at revision 2').waitFor();
    await review.getByRole('button', { name: 'Request changes' }).waitFor();
    expect(await review.getByRole('button', { name: /^Approve/ }).count()).toBe(0);
    await review.scrollIntoViewIfNeeded();
    await saveScreenshot(lena, 'review-approved-by-reviewer');
  });

  it('when the editor opens the project, then the figure table shows 4.3 approved at revision 2', async () => {
    await openProject(ravi, stack.baseUrl, 'ravi.mendes@harrowgate.example');
    const row = ravi
      .getByRole('table', { name: /Figures in this project/ })
      .getByRole('row', { name: new RegExp(FIGURE) });
    await row.waitFor();
    const text = (await row.textContent()) ?? '';
    expect(text).toContain('4.3');
    expect(text).toContain('Approved');
    expect(text).toContain('approved at revision 2');
    await saveScreenshot(ravi, 'review-figure-table-after-approval');
  });

  it('when the editor opens the figure, then he sees the approval, the comment, and can reply to it', async () => {
    await ravi.getByRole('link', { name: FIGURE, exact: true }).click();
    const review = ravi.getByRole('region', { name: 'Review', exact: true });
    await review.getByText('Approved revision: 2').waitFor();
    await review.getByText(COMMENT).waitFor();
    await review
      .getByRole('table', { name: /Status history/ })
      .getByRole('rowheader', { name: 'Lena Brandt' })
      .waitFor();
    await review.getByRole('button', { name: 'Reply to Lena Brandt' }).click();
    await review.getByRole('textbox', { name: 'Reply to Lena Brandt' }).fill('Thank you, Lena.');
    await review.getByRole('button', { name: 'Post reply' }).click();
    const thread = review.getByRole('region', { name: 'Comments on revision 2' });
    await thread.getByRole('article', { name: 'Comment by Ravi Mendes' }).waitFor();
    await thread.getByText('2 comments').waitFor();
    await review.scrollIntoViewIfNeeded();
    await saveScreenshot(ravi, 'review-seen-by-editor');
  });

  it('when the editor approves a figure the reviewer approved meanwhile, then he is told why and sees the current status', async () => {
    const balmer = 'Energy levels and the Balmer series';
    for (const page of [ravi, lena]) {
      await page.getByRole('link', { name: 'Atoms & Bonds — Chapter 4: The Hydrogen Atom' }).click();
      await page.getByRole('link', { name: balmer, exact: true }).click();
      await page.getByRole('region', { name: 'Review', exact: true }).getByText('In review', { exact: true }).waitFor();
    }
    const lenaReview = lena.getByRole('region', { name: 'Review', exact: true });
    await lenaReview.getByRole('button', { name: 'Approve revision 1' }).click();
    await lenaReview.getByText('Approved revision: 1').waitFor();

    const raviReview = ravi.getByRole('region', { name: 'Review', exact: true });
    await raviReview.getByRole('button', { name: 'Approve revision 1' }).click();
    const alert = raviReview.getByRole('alert');
    await alert.waitFor();
    expect(await alert.textContent()).toMatch(
      /^A figure that is approved cannot be approved; .*Someone changed the status meanwhile; the status shown is now the current one\.$/,
    );
    await raviReview.getByText('Approved revision: 1').waitFor();
    await raviReview.getByRole('button', { name: 'Request changes' }).waitFor();
    await raviReview.scrollIntoViewIfNeeded();
    await saveScreenshot(ravi, 'review-conflict');
    expect(problems).toEqual([]);
  });
});

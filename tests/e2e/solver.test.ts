// Browser end-to-end: an editor turns a figure into an effective-potential figure, picks a screened
// Coulomb potential, reads the solved levels with their estimated errors, sees the solver refuse an
// unbound l in its own words, and weakens the screening until that l binds.
// Check values: Yukawa Z = 1, λ = 0.1 bohr⁻¹: 1s at −0.407058 hartree (Rogers, Graboske & Harwood,
// Phys. Rev. A 1, 1577 (1970), from memory: −0.40706); 3d is bound only for λ < λ_c = 0.0913 (REFERENCE.md
// §10.5), so l = 2 binds nothing at λ = 0.1 and binds 3d at λ = 0.05.
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startStack } from '../support/stack';
import { launchChromium, saveScreenshot, watchForProblems } from './support/chromium';
import { signIn } from './support/sign-in';

const PROJECT = 'Atoms & Bonds — Chapter 4: The Hydrogen Atom';

describe('the potential picker in the composer', () => {
  let stack: Awaited<ReturnType<typeof startStack>>;
  let browser: Browser;
  let page: Page;
  let problems: string[];

  const preview = () => page.getByRole('region', { name: 'Preview' });
  const levelsTable = () => page.getByRole('table', { name: 'Lowest levels (solved numerically)' });

  beforeAll(async () => {
    stack = await startStack();
    browser = await launchChromium();
    page = await (await browser.newContext({ viewport: { width: 1360, height: 1000 } })).newPage();
    problems = watchForProblems(page);
    await signIn(page, stack.baseUrl, 'ravi.mendes@harrowgate.example');
    await page.getByRole('link', { name: PROJECT }).click();
    await page.getByRole('link', { name: /^The 3d_z² orbital$|^The 3dz² orbital$/ }).click();
    await page.getByRole('heading', { level: 1, name: /Figure 4\.4/ }).waitFor();
  });

  afterAll(async () => {
    await browser?.close();
    await stack?.stop();
  });

  it('when the kind becomes an effective potential, then the Yukawa figure is drawn with its solved levels', async () => {
    await page.getByRole('tab', { name: 'Figure' }).click();
    await page.getByLabel('Kind of figure').selectOption('potential');
    expect(await page.getByLabel('Potential', { exact: true }).inputValue()).toBe('yukawa');
    expect(await page.getByLabel('Screening λ').inputValue()).toBe('0.1');
    await page
      .locator('[data-figure-ready="true"]')
      .filter({ hasText: /Figure ready/ })
      .waitFor({ timeout: 30_000 });
    await expect
      .poll(async () => (await preview().locator('svg').first().textContent()) ?? '', {
        timeout: 30_000,
      })
      .toContain('1s: −0.407058 hartree');
    const row = levelsTable().getByRole('row', { name: /^1s/ });
    await row.waitFor({ timeout: 30_000 });
    const cells = await row.getByRole('cell').allTextContents();
    expect(cells[0]).toBe('−0.40705803');
    expect(Number(cells[1].replace('−', '-'))).toBeLessThan(1e-9);
    expect(cells[2]).toBe('0');
    await saveScreenshot(page, 'solver-yukawa');
  });

  it('when l = 2 binds nothing, then the solver says so; weaker screening binds 3d', async () => {
    await page
      .getByRole('alert')
      .filter({ hasText: 'The solver refuses (l = 2): the potential binds no level with l = 2' })
      .waitFor({ timeout: 30_000 });
    const lambda = page.getByLabel('Screening λ');
    await lambda.fill('0.05');
    await lambda.blur();
    const row = levelsTable().getByRole('row', { name: /^3d/ });
    await row.waitFor({ timeout: 30_000 });
    expect(await page.getByRole('alert').filter({ hasText: 'l = 2' }).count()).toBe(0);
    await saveScreenshot(page, 'solver-yukawa-weaker');
  });

  it('when a parameter is out of its limits, then the box says so and the figure keeps its value', async () => {
    const lambda = page.getByLabel('Screening λ');
    await lambda.fill('-1');
    await page.getByText('Screening λ: enter 0 to 10; the potential keeps 0.05.').waitFor();
    await lambda.blur();
    expect(problems).toEqual([]);
  });

  it('when a radial plot also solves for a potential, then a solved curve is drawn beside hydrogen’s', async () => {
    await page.getByLabel('Kind of figure').selectOption('radial');
    await page.getByLabel('Also solve for another potential').check();
    expect(await page.getByLabel('Potential', { exact: true }).inputValue()).toBe('yukawa');
    // 3d binds only for λ < 0.0913 (REFERENCE.md §10.5): screen weakly so the solved 3d exists.
    const lambda = page.getByLabel('Screening λ');
    await lambda.fill('0.01');
    await lambda.blur();
    await page.getByLabel('Curve 1 from').selectOption('solved');
    await expect
      .poll(async () => (await preview().locator('svg').first().textContent()) ?? '', { timeout: 30_000 })
      .toMatch(/\(solved\)/);
    await saveScreenshot(page, 'solver-radial-solved-curve');
  });

  it('when a level diagram compares with a solved potential, then the solved levels are drawn beside hydrogen’s', async () => {
    await page.getByLabel('Kind of figure').selectOption('levels');
    await page.getByLabel('Compare with levels solved for another potential').check();
    await page.getByLabel('Solved levels for l up to').waitFor();
    await expect
      .poll(async () => (await preview().locator('svg').first().textContent()) ?? '', { timeout: 30_000 })
      .toMatch(/hydrogen/i);
    await saveScreenshot(page, 'solver-levels-compare');
    expect(problems).toEqual([]);
  });
});

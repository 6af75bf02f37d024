import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startAppServer, type AppServer } from './support/app-server';
import { launchBrowser } from './support/browser';
import { fractionText, screenshot, signIn, type Session } from './support/journey';

// Published reactions (/work/shared/reference/check-values.md §2):
// R3  K-feldspar → kaolinite, Hiscock (2005) Table 3.14 after Freeze & Cherry (1979): −1 H+ per KAlSi3O8.
// R15 pyrite by O2 → Fe2+, Reitner & Thiel (2011), Encyclopedia of Geobiology.
// R20 Fe2+ oxidation and hydrolysis, Andrews et al., eq. 5.16.
// R15 + 1/4 R20 = R16, Itasca report eq. 3.1: 4 mol H+ per mol pyrite.
const FELDSPAR_TYPED = 'KAlSi3O8 + 2 H+ + H2O -> Al2Si2O5(OH)4 + K+ + 2 H4SiO4';
const FELDSPAR_PUBLISHED = '2 KAlSi3O8 + 2 H+ + 9 H2O -> Al2Si2O5(OH)4 + 2 K+ + 4 H4SiO4';
const PYRITE_TO_FERROUS = 'FeS2 + 7/2 O2 + H2O -> Fe^2+ + 2 SO4^2- + 2 H+';
const FERROUS_OXIDATION = '4 Fe^2+ + O2 + 10 H2O -> 4 Fe(OH)3 + 8 H+';

describe('A geochemist writes, checks, combines and shares a reaction set', () => {
  let server: AppServer;
  let browser: Browser;
  let editor: Session;
  const setName = `Tarn pit reactions ${Date.now().toString(36)}`;
  let setUrl = '';

  beforeAll(async () => {
    server = await startAppServer({ isDemoSeeded: true });
    browser = await launchBrowser();
  });

  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('When a demo editor signs in, then the team home lists the demo reaction sets', async () => {
    editor = await signIn(browser, server.baseUrl, 'editor@kestrel.example');
    const { page } = editor;
    await expect.poll(() => page.getByRole('heading', { name: 'Kestrel Flats' }).isVisible()).toBe(true);
    await expect.poll(() => page.locator('tl-set-table tr.mat-mdc-row').count(), { timeout: 15_000 }).toBeGreaterThan(0);
    await screenshot(page, '01-team-home');
  });

  it('When they create a set, then its empty editor opens', async () => {
    const { page } = editor;
    await page.getByRole('button', { name: 'New reaction set' }).click();
    await page.getByLabel('Name').fill(setName);
    await page.getByLabel('Site or purpose').fill('Tarn pit waste-rock dump (invented)');
    await page.getByRole('button', { name: 'Create set' }).click();
    await page.waitForURL(/reaction-sets\/[0-9a-f-]+/);
    setUrl = page.url().split('?')[0];
    await expect.poll(() => page.getByRole('heading', { name: setName }).isVisible()).toBe(true);
    await expect.poll(() => page.getByText('No reactions yet').isVisible()).toBe(true);
  });

  it('When they type an unbalanced feldspar-to-kaolinite reaction, then it reads unbalanced with its residuals', async () => {
    const { page } = editor;
    await page.getByRole('button', { name: 'Add reaction', exact: true }).click();
    await page.getByLabel('Name', { exact: true }).fill('K-feldspar to kaolinite');
    await page.getByLabel('Kind').click();
    await page.getByRole('option', { name: 'alteration' }).click();
    await page.getByLabel('Equation', { exact: true }).fill(FELDSPAR_TYPED);
    const status = page.locator('tl-reaction-check tl-balance-status');
    await expect.poll(() => status.getAttribute('data-status')).toBe('unbalanced');
    expect(await status.textContent()).toContain('unbalanced');
    expect(await page.locator('tl-reaction-check .residuals tr.is-off th').allTextContents()).toEqual(['Al', 'Si', 'O', 'H', 'charge']);
    await screenshot(page, '02-unbalanced');
  });

  it('When they balance it, then the published coefficients and proton budget appear (Hiscock 2005, Table 3.14)', async () => {
    const { page } = editor;
    await page.getByRole('button', { name: 'Balance', exact: true }).click();
    await expect.poll(() => page.getByLabel('Equation', { exact: true }).inputValue()).toBe(FELDSPAR_PUBLISHED);
    const status = page.locator('tl-reaction-check tl-balance-status');
    await expect.poll(() => status.getAttribute('data-status')).toBe('balanced');
    expect(await fractionText(page, 'tl-reaction-check .protons .lead tl-fraction')).toBe('-1');
    await page.getByLabel('Citation').fill('Hiscock (2005) Table 3.14, after Freeze & Cherry (1979)');
    await screenshot(page, '03-balanced');
    await page.getByRole('button', { name: 'Add reaction', exact: true }).click();
    await expect.poll(() => page.locator('tl-reaction-list li[data-reaction="K-feldspar to kaolinite"]').count()).toBe(1);
  });

  it('When they add the pyrite and Fe2+ oxidation reactions, then the list shows all three, balanced', async () => {
    const { page } = editor;
    for (const [name, equation] of [
      ['Pyrite oxidation to Fe2+', PYRITE_TO_FERROUS],
      ['Fe2+ oxidation and hydrolysis', FERROUS_OXIDATION],
    ]) {
      await page.getByRole('button', { name: 'Add reaction', exact: true }).click();
      await page.getByLabel('Name', { exact: true }).fill(name);
      await page.getByLabel('Kind').click();
      await page.getByRole('option', { name: 'oxidation', exact: true }).click();
      await page.getByLabel('Equation', { exact: true }).fill(equation);
      await expect.poll(() => page.locator('tl-reaction-check tl-balance-status').getAttribute('data-status')).toBe('balanced');
      await page.getByRole('button', { name: 'Add reaction', exact: true }).click();
      await expect.poll(() => page.locator(`tl-reaction-list li[data-reaction="${name}"]`).count()).toBe(1);
    }
    const statuses = await page.locator('tl-reaction-list tl-balance-status').evaluateAll((nodes) => nodes.map((node) => node.getAttribute('data-status')));
    expect(statuses).toEqual(['balanced', 'balanced', 'balanced']);
    await screenshot(page, '04-reaction-list');
  });

  it('When they cancel Fe2+ between pyrite oxidation and Fe2+ oxidation, then the net reaction has multipliers 1 and 1/4 and 4 H+ per pyrite', async () => {
    const { page } = editor;
    await page.getByRole('tab', { name: /Net reactions/ }).click();
    await page.getByRole('checkbox', { name: 'Pyrite oxidation to Fe2+' }).check();
    await page.getByRole('checkbox', { name: 'Fe2+ oxidation and hydrolysis' }).check();
    await page.getByRole('option', { name: 'Fe^2+' }).click();
    await expect.poll(() => page.locator('.result .status-line').textContent()).toContain('combined');
    const multipliers = await page.locator('.multipliers td tl-fraction .tl-visually-hidden').allTextContents();
    expect(multipliers.map((text) => text.trim())).toEqual(['1', '1/4']);
    expect(await fractionText(page, '.result .proton tl-fraction')).toBe('4');
    await page.getByLabel('Name of the net reaction').fill('Pyrite to ferric hydroxide');
    await screenshot(page, '05-net-reaction');
    await page.getByRole('button', { name: 'Save to the set' }).click();
    await expect.poll(() => page.locator('.saved li').count()).toBe(1);
  });

  it('When they open the saved net reaction again, fix a multiplier and rename it, then the set keeps one net reaction with the changes', async () => {
    const { page } = editor;
    await page.getByRole('button', { name: 'Change Pyrite to ferric hydroxide' }).click();
    await expect.poll(() => page.locator('.editing').textContent()).toContain('Pyrite to ferric hydroxide');
    expect(await page.getByRole('checkbox', { name: 'Fe2+ oxidation and hydrolysis' }).isChecked()).toBe(true);
    await page.getByLabel('Fixed multiplier of Fe2+ oxidation and hydrolysis').fill('1/4');
    await page.getByLabel('Name of the net reaction').fill('Pyrite to ferric hydroxide, overall');
    await expect.poll(() => page.locator('.result .status-line').textContent()).toContain('combined');
    await screenshot(page, '05b-net-reaction-changing');
    await page.getByRole('button', { name: 'Save changes' }).click();

    await expect.poll(() => page.locator('.saved li strong').allTextContents()).toEqual(['Pyrite to ferric hydroxide, overall']);
    expect(await page.locator('.editing').count()).toBe(0);
    expect(await fractionText(page, '.saved li tl-fraction')).toBe('4');
  });

  it('When they open the proton budget chart, then each reaction and the net reaction are plotted', async () => {
    const { page } = editor;
    await page.getByRole('tab', { name: 'Proton budget chart' }).click();
    await expect.poll(() => page.locator('tl-proton-chart canvas').count()).toBe(1);
    expect(await page.locator('tl-proton-chart .figures tbody tr').count()).toBe(4);
    await screenshot(page, '06-proton-chart');
  });

  it('When they add a species with a mixed site, then the field says why and underlines where, and the molar mass follows the fix', async () => {
    const { page } = editor;
    await page.getByRole('link', { name: 'Species catalogue' }).first().click();
    await expect.poll(() => page.locator('tr.is-builtin').count(), { timeout: 15_000 }).toBeGreaterThan(0);
    await screenshot(page, '07-species-catalogue');
    await page.getByRole('button', { name: 'Add species' }).click();
    const formula = page.getByLabel('Formula', { exact: true });
    await formula.fill('(Mg,Fe)2SiO4');
    await formula.blur();
    await expect.poll(() => page.locator('tl-formula-field mark.culprit').textContent()).toBe('(Mg,Fe)');
    await screenshot(page, '08-species-error');
    await formula.fill('(Mg0.92,Fe0.08)2SiO4');
    // Fo92 olivine: M = 145.74 g/mol (check-values.md §7).
    await expect.poll(() => page.locator('tl-formula-field .mass .value').textContent()).toMatch(/^145\.7\d\d$/);
    await page.getByRole('button', { name: 'Cancel' }).click();
  });

  it('When they submit the set, then it is in review', async () => {
    const { page } = editor;
    await page.goto(`${setUrl}?tab=review`);
    await page.getByLabel('Note to the reviewers').fill('Three reactions and the pyrite net reaction, ready for review.');
    await page.getByRole('button', { name: 'Submit for review' }).click();
    await expect.poll(() => page.locator('tl-review-panel .state-line').textContent()).toContain('in review');
    await screenshot(page, '09-submitted');
    await editor.context.close();
  });

  it('When a demo reviewer approves it, then it is vetted as revision 1', async () => {
    const reviewer = await signIn(browser, server.baseUrl, 'reviewer@kestrel.example');
    const { page } = reviewer;
    await expect.poll(() => page.getByRole('link', { name: setName }).first().isVisible(), { timeout: 15_000 }).toBe(true);
    await screenshot(page, '10-review-queue');
    await page.locator('.queue').getByRole('link', { name: setName }).click();
    await page.getByLabel('Comment to the author').fill('Coefficients match the cited sources.');
    await page.getByRole('button', { name: 'Approve' }).click();
    await expect.poll(() => page.locator('tl-review-panel .state-line').textContent()).toContain('vetted');
    await screenshot(page, '11-approved');
    await reviewer.context.close();
  });

  it('When the demo owner publishes it, then it is in the library', async () => {
    const owner = await signIn(browser, server.baseUrl, 'owner@kestrel.example');
    const { page } = owner;
    await page.goto(`${setUrl}?tab=review`);
    await page.getByRole('button', { name: /Publish revision 1/ }).click();
    await expect.poll(() => page.getByText('in the library').first().isVisible()).toBe(true);
    await screenshot(page, '12-published');
    await owner.context.close();
  });

  it('When an editor of the other demo team copies it from the library, then it opens as their draft', async () => {
    const other = await signIn(browser, server.baseUrl, 'editor@ironbark.example');
    const { page } = other;
    await page.getByRole('link', { name: 'Library' }).first().click();
    await page.locator('.pub', { hasText: setName }).click();
    await expect.poll(() => page.locator('.preview .reactions li').count()).toBeGreaterThanOrEqual(3);
    await screenshot(page, '13-library');
    await page.getByRole('button', { name: 'Copy as draft' }).click();
    await page.waitForURL(/reaction-sets\/[0-9a-f-]+/);
    await expect.poll(() => page.getByText(/copied from Kestrel Flats/).isVisible()).toBe(true);
    expect(await page.locator('tl-reaction-list li').count()).toBe(3);
    await screenshot(page, '14-copied');
    await other.context.close();
  });
});

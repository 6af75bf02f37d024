import { readFileSync, writeFileSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startAppServer, type AppServer } from './support/app-server';
import { launchBrowser } from './support/browser';
import { screenshot, signIn, type Session } from './support/journey';

// Check values: the An38 plagioclase Na0.62Ca0.38Al1.38Si2.62O8 recalculated on 8 O
// (Brady & Perkins method; libs/chem oxides.spec round trip) has An = 38 %.
describe('A consultant works through the site data of Kestrel Flats', () => {
  let server: AppServer;
  let browser: Browser;
  let editor: Session;
  let teamUrl = '';
  const suffix = Date.now().toString(36);

  beforeAll(async () => {
    server = await startAppServer({ isDemoSeeded: true });
    browser = await launchBrowser();
    editor = await signIn(browser, server.baseUrl, 'editor@kestrel.example');
    teamUrl = editor.page.url().split('?')[0].replace(/\/$/, '');
  });

  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('When the editor uploads a CSV of waters, then the preview names the bad cell and only the valid rows are saved', async () => {
    const { page } = editor;
    await page.getByRole('link', { name: 'Water analyses' }).click();
    await page.waitForURL(/water-analyses$/);
    // Invented waters; the last row has a value that is no number, the third a charge imbalance.
    const csv = [
      'sample,site,date,temperature_c,ph,notes,Na (mmol/L),Ca (mmol/L),Mg (mmol/L),K (mmol/L),HCO3 (mmol/L),SiO2 (mmol/L)',
      `JR-RAIN-${suffix},Journey ridge (invented),2026-03-02,12,5.6,invented rain,0.024,0.010,0.007,0.008,0.018,<0.001`,
      `JR-SPRING-${suffix},Journey ridge (invented),2026-03-04,14,7.1,invented spring,0.134,0.078,0.029,0.028,0.328,0.41`,
      `JR-SEEP-${suffix},Journey ridge (invented),2026-03-04,15,6.2,invented seep,0.5,2.0,0.4,0.05,1.0,0.3`,
      `JR-BAD-${suffix},Journey ridge (invented),2026-03-05,15,6.9,,0.2,n.d.,0.1,0.01,0.5,0.2`,
    ].join('\n');
    const file = join(mkdtempSync(join(tmpdir(), 'tallus-')), 'waters.csv');
    writeFileSync(file, csv);
    await page.getByRole('button', { name: 'Upload CSV' }).click();
    await page.getByLabel('CSV file').setInputFiles(file);
    await expect.poll(() => page.locator('table[aria-label="Problems by line and column"] tbody th').first().textContent(), { timeout: 15_000 }).toMatch(/Line 5, column “Ca \(mmol\/L\)”/);
    await screenshot(page, 'site-data-01-water-upload-preview');
    await page.getByRole('button', { name: /Save 3 valid, leave 1 out/ }).click();
    await expect.poll(() => page.getByText('3 water analyses saved.').isVisible(), { timeout: 15_000 }).toBe(true);
  });

  it('When the editor opens water analyses, then each has its CBE and at least one is flagged with an icon and a word', async () => {
    const { page } = editor;
    await page.goto(`${teamUrl}/water-analyses`);
    await expect.poll(() => page.locator('[data-testid=cbe-flag]').count(), { timeout: 15_000 }).toBeGreaterThan(0);
    const flags = await page.locator('[data-testid=cbe-flag]').allTextContents();
    expect(flags.some((text) => /flag\s*over ±/.test(text))).toBe(true);
    await screenshot(page, 'site-data-02-water-analyses');
    await page.locator('table[aria-label="Water analyses"] tbody th a').first().click();
    await page.waitForURL(/water-analyses\/[0-9a-f-]+$/);
    await expect.poll(() => page.locator('aside[aria-label="Charge balance"] [data-testid=cbe-flag]').count()).toBe(1);
    await screenshot(page, 'site-data-03-water-analysis');
  });

  it('When they solve the demo mass-balance model again, then models with exact transfers, validity and a net reaction appear', async () => {
    const { page } = editor;
    await page.goto(`${teamUrl}/mass-balance`);
    await expect.poll(async () => (await page.locator('table[aria-label="Mass-balance models"]').count()) + (await page.locator('.tl-empty').count()), { timeout: 15_000 }).toBeGreaterThan(0);
    if ((await page.locator('table[aria-label="Mass-balance models"]').count()) > 0) {
      await page.locator('table[aria-label="Mass-balance models"] tbody th a').first().click();
      await page.waitForURL(/mass-balance\/[0-9a-f-]+$/);
      await page.getByRole('button', { name: 'Solve again' }).click();
    } else {
      await defineModel();
    }
    await expect.poll(() => page.getByText(/saved and solved/).isVisible(), { timeout: 15_000 }).toBe(true);
    const rows = page.locator('table[aria-label^="Models and mole transfers"] tbody tr');
    await expect.poll(() => rows.count()).toBeGreaterThan(0);
    expect(await rows.first().locator('tl-fraction').count()).toBeGreaterThan(0);
    expect(await rows.first().textContent()).toMatch(/valid|breaks a rule/);
    await expect.poll(() => page.locator('tl-transfers-chart canvas').count()).toBe(1);
    await screenshot(page, 'site-data-04-mass-balance');
  });

  /** Without demo models: rain to spring with plagioclase, kaolinite, CO2 gas and Ca/Na exchange (Garrels & Mackenzie style, invented waters). */
  async function defineModel(): Promise<void> {
    const { page } = editor;
    await page.getByRole('link', { name: 'New model' }).click();
    await page.waitForURL(/mass-balance\/new$/);
    await page.getByLabel('Model name').fill(`Rain to spring ${suffix}`);
    await page.getByLabel('Initial water').click();
    await page.getByRole('option', { name: new RegExp(`JR-RAIN-${suffix}`) }).click();
    await page.getByLabel('Final water').click();
    await page.getByRole('option', { name: new RegExp(`JR-SPRING-${suffix}`) }).click();
    const phases: [string, string, string][] = [
      ['plagioclase', 'Na0.62Ca0.38Al1.38Si2.62O8', 'dissolve'],
      ['kaolinite', 'Al2Si2O5(OH)4', 'precipitate'],
      ['CO2 gas', 'CO2(g)', 'dissolve'],
      ['Ca/Na exchange', 'Ca^2+ + 2 NaX -> CaX2 + 2 Na+', 'either'],
    ];
    for (const [index, [name, formula, rule]] of phases.entries()) {
      if (index > 0) await page.getByRole('button', { name: 'Add phase' }).click();
      await page.getByLabel(`Name of phase ${index + 1}`).fill(name);
      await page.getByLabel(`Source of phase ${index + 1}`).selectOption(formula.includes('->') ? 'equation' : 'formula');
      await page.getByLabel(`Formula or reaction of phase ${index + 1}`).fill(formula);
      await page.getByLabel(`Rule of phase ${index + 1}`).selectOption(rule);
    }
    for (const element of ['Na', 'Ca', 'C', 'Si']) await page.getByRole('checkbox', { name: element, exact: true }).check();
    await page.getByRole('button', { name: 'Save and solve' }).click();
  }

  it('When they open rock samples, then each sample has a class with a word, the plot has its band lines, and the caution is shown', async () => {
    const { page } = editor;
    await page.goto(`${teamUrl}/rock-samples`);
    await expect.poll(async () => (await page.locator('table[aria-label^="Rock samples"]').count()) + (await page.locator('.tl-empty').count()), { timeout: 15_000 }).toBeGreaterThan(0);
    if ((await page.locator('table[aria-label^="Rock samples"]').count()) === 0) {
      // Without demo samples: invented waste rock; AP = 31.25 × sulfide S (Sobek et al. 1978).
      const csv = [
        'sample,site,depth_from_m,depth_to_m,lithology,total_s_pct,sulfide_s_pct,sulfate_s_pct,np_kg_caco3_t,paste_ph,notes,mode:pyrite,mode:calcite',
        `JR-WR-1-${suffix},Journey ridge (invented),0,5,andesite,1.4,1.2,0.2,18,3.6,,2.2,1.5`,
        `JR-WR-2-${suffix},Journey ridge (invented),5,10,andesite,0.5,0.4,0.1,30,6.8,,0.7,2.0`,
        `JR-WR-3-${suffix},Journey ridge (invented),10,15,andesite,0.08,,,45,8.1,,,`,
      ].join('\n');
      const file = join(mkdtempSync(join(tmpdir(), 'tallus-')), 'rocks.csv');
      writeFileSync(file, csv);
      await page.getByRole('button', { name: 'Upload CSV' }).click();
      await page.getByLabel('CSV file').setInputFiles(file);
      await page.getByRole('button', { name: 'Save 3 rock samples' }).click();
    }
    await expect.poll(() => page.locator('[data-testid=aba-class]').count(), { timeout: 15_000 }).toBeGreaterThan(0);
    const classes = await page.locator('[data-testid=aba-class]').allTextContents();
    expect(classes.some((text) => /potentially acid generating|uncertain|non-acid generating/.test(text))).toBe(true);
    expect(await page.getByText(/not a substitute for kinetic testing, site investigation, local regulation/).first().isVisible()).toBe(true);
    expect(await page.locator('tl-np-ap-plot canvas').count()).toBe(1);
    await page.locator('table[aria-label^="Rock samples"] tbody th button').first().click();
    await expect.poll(() => page.locator('tl-sample-detail').count()).toBe(1);
    await screenshot(page, 'site-data-05-rock-samples');
  });

  it('When they add a sample by hand and then correct its sulfide S, then its AP follows (31.25 × sulfide S, Sobek et al. 1978), and it can be deleted', async () => {
    const { page } = editor;
    const name = `JR-HAND-${suffix}`;
    const rowOf = () => page.locator('table[aria-label^="Rock samples"] tbody tr').filter({ has: page.getByRole('button', { name, exact: true }) });
    await page.getByRole('button', { name: 'Add sample' }).click();
    const form = page.getByRole('dialog');
    await form.getByLabel('Sample', { exact: true }).fill(name);
    await form.getByLabel('Depth from (m)').fill('5');
    await form.getByLabel('Depth to (m)').fill('2');
    await form.getByLabel('Sulfide S (wt%)').fill('1.6');
    await form.getByLabel('Measured NP (kg CaCO₃/t)').fill('20');
    await form.getByRole('button', { name: 'Add sample' }).click();
    await expect.poll(() => form.getByText('The interval ends above where it starts').count()).toBe(1);
    await screenshot(page, 'site-data-05b-sample-form');
    await form.getByLabel('Depth to (m)').fill('8');
    await form.getByRole('button', { name: 'Add sample' }).click();

    // Invented sample: AP = 31.25 × 1.6 = 50.0 kg CaCO3/t; NNP = 20 − 50 = −30.
    await expect.poll(async () => (await rowOf().locator('td').allTextContents()).map((text) => text.trim()), { timeout: 15_000 }).toContain('50.0');
    expect((await rowOf().locator('td').allTextContents()).map((text) => text.trim())).toContain('−30.0');
    await page.getByRole('button', { name: 'Correct this sample' }).click();
    await expect.poll(() => form.getByLabel('Sulfide S (wt%)').inputValue()).toBe('1.6');
    await form.getByLabel('Sulfide S (wt%)').fill('0.8');
    await form.getByRole('button', { name: 'Save changes' }).click();
    await expect.poll(async () => (await rowOf().locator('td').allTextContents()).map((text) => text.trim())).toContain('25.0');

    page.once('dialog', (dialog) => void dialog.accept());
    await page.getByRole('button', { name: 'Delete', exact: true }).click();
    await expect.poll(() => rowOf().count()).toBe(0);
  });

  it('When they recalculate a plagioclase analysis, then its formula and An content appear as they type', async () => {
    const { page } = editor;
    await page.goto(`${teamUrl}/mineral-formulas`);
    await page.getByRole('button', { name: 'Plagioclase An38 (synthetic)' }).click();
    const formula = page.locator('[data-testid=recalculated-formula] tl-formula-text');
    await expect.poll(() => formula.getAttribute('aria-label')).toBe('Na0.62Ca0.38Al1.38Si2.62O8');
    const anorthite = await page.locator('[data-member=An] .value').textContent();
    expect(Number(anorthite?.replace('%', '').trim())).toBeCloseTo(38, 0);
    await screenshot(page, 'site-data-06-mineral-formula');
  });

  it('When they download the site report, then a PDF of real size arrives', async () => {
    const { page } = editor;
    await page.goto(`${teamUrl}/reports`);
    const button = page.locator('table[aria-label="Sites"] tbody tr').first().getByRole('button', { name: 'PDF' });
    await expect.poll(() => button.isVisible(), { timeout: 15_000 }).toBe(true);
    const [response, download] = await Promise.all([
      page.waitForResponse((answer) => answer.url().includes('/site-report.pdf'), { timeout: 60_000 }),
      page.waitForEvent('download', { timeout: 60_000 }),
      button.click(),
    ]);
    expect(response.headers()['content-type']).toContain('application/pdf');
    const path = await download.path();
    const bytes = readFileSync(path);
    expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
    expect(bytes.length).toBeGreaterThan(10_000);
    await screenshot(page, 'site-data-07-reports');
  });
});

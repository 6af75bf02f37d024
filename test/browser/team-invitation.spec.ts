import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startAppServer, type AppServer } from './support/app-server';
import { launchBrowser } from './support/browser';

describe('A new user sets up a team and invites a colleague', () => {
  let server: AppServer;
  let browser: Browser;
  let page: Page;
  const stamp = Date.now().toString(36);
  const ownerEmail = `founder-${stamp}@example.org`;
  const colleagueEmail = `colleague-${stamp}@example.org`;

  beforeAll(async () => {
    server = await startAppServer();
    browser = await launchBrowser();
    page = await browser.newPage({ viewport: { width: 1366, height: 800 } });
  });

  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('When a visitor registers, then the shell greets them signed in', async () => {
    await page.goto(`${server.baseUrl}/register`);
    await page.getByLabel('Display name').fill('Rowan Tester');
    await page.getByLabel('E-mail').fill(ownerEmail);
    await page.getByLabel('Password').fill('a-long-test-password');
    await page.getByRole('button', { name: 'Create account' }).click();

    // Registration hashes the password (bcrypt) and loads the shell's chunk: allow more than the default second.
    await expect.poll(() => page.getByText('Rowan Tester').first().isVisible(), { timeout: 10_000 }).toBe(true);
  });

  it('When they create a team, then they are its owner', async () => {
    await page.getByRole('button', { name: /New team/ }).first().click();
    await page.getByLabel('Team name').fill(`Test Catchment ${stamp}`);
    await page.getByRole('button', { name: 'Create team' }).click();

    await expect.poll(() => page.getByText(`Test Catchment ${stamp}`).first().isVisible()).toBe(true);
    await expect.poll(() => page.getByText(/owner/i).first().isVisible()).toBe(true);
  });

  it('When the owner invites a colleague, then the e-mail reaches the outbox with its link', async () => {
    await page.getByRole('link', { name: /Members/ }).first().click();
    await page.getByLabel('E-mail').fill(colleagueEmail);
    await page.getByLabel('Role').click();
    await page.getByRole('option', { name: /editor/i }).click();
    await page.getByRole('button', { name: 'Send invitation' }).click();
    await expect.poll(() => page.getByText(colleagueEmail).first().isVisible()).toBe(true);

    await page.getByRole('link', { name: /Outbox/ }).first().click();
    await expect.poll(() => page.getByRole('heading', { name: 'Outbox' }).isVisible()).toBe(true);
    const message = page.getByText(colleagueEmail).first();
    await expect.poll(() => message.isVisible()).toBe(true);
    await expect.poll(() => page.getByText(/invitations\/accept\?token=/).first().isVisible()).toBe(true);
  });
});

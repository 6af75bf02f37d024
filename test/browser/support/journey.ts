import { mkdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { Browser, BrowserContext, Page } from 'playwright-core';

/** Where journeys save their screenshots (git-ignored through `.tmp/`). */
export const SCREENSHOT_DIR = fileURLToPath(new URL('../../../.tmp/screenshots/', import.meta.url));

/** The password of every invented demo account (apps/api/src/db/seeders/demo-accounts.ts). */
export const DEMO_PASSWORD = 'tallus-demo-2026';

/** A signed-in demo user in a browser context of their own. */
export interface Session {
  context: BrowserContext;
  page: Page;
}

/**
 * Opens a fresh browser context (laptop-sized) and signs in through the sign-in screen.
 *
 * @param browser the launched browser
 * @param baseUrl the app server's address
 * @param email a demo account's e-mail
 */
export async function signIn(browser: Browser, baseUrl: string, email: string): Promise<Session> {
  const context = await browser.newContext({ viewport: { width: 1366, height: 900 }, acceptDownloads: true });
  const page = await context.newPage();
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/teams\/[0-9a-f-]+/, { timeout: 20_000 });
  return { context, page };
}

/**
 * Saves a full-page screenshot as `<name>.png` under {@link SCREENSHOT_DIR}.
 *
 * @param page the page
 * @param name a file name without extension, e.g. `03-unbalanced`
 */
export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  // Let animations and the debounced check settle before the picture.
  await page.waitForTimeout(300);
  // The page scrolls inside the shell's content pane, so grow the window to the content for the picture.
  const viewport = page.viewportSize() ?? { width: 1366, height: 900 };
  const contentHeight = await page.evaluate(() => {
    const pane = document.querySelector('mat-sidenav-content');
    return pane ? pane.scrollHeight + 56 : document.body.scrollHeight;
  });
  const hasDialog = (await page.locator('mat-dialog-container').count()) > 0;
  if (!hasDialog && contentHeight > viewport.height) await page.setViewportSize({ width: viewport.width, height: Math.min(contentHeight, 4000) });
  await page.screenshot({ path: `${SCREENSHOT_DIR}${name}.png` });
  await page.setViewportSize(viewport);
}

/**
 * The text a screen reader hears for an exact number (`tl-fraction` keeps it visually hidden).
 *
 * @param page the page
 * @param selector CSS selector of one `tl-fraction`
 */
export async function fractionText(page: Page, selector: string): Promise<string> {
  return (await page.locator(`${selector} .tl-visually-hidden`).first().textContent())?.trim() ?? '';
}

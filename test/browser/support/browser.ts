import { chromium, type Browser } from 'playwright-core';

/**
 * Launches Debian's Chromium headless (never a downloaded browser). The background-networking flags
 * keep Chromium from calling out of this closed network at every start.
 */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

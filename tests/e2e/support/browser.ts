import { chromium, type Browser } from 'playwright-core';

/**
 * Debian's chromium, headless, with everything that would reach the network on its own turned
 * off (updates, sync, QUIC), so a run depends only on the app under test.
 */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
      '--disable-quic',
    ],
  });
}

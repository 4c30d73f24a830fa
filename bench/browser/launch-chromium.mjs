/**
 * Debian's Chromium, headless, launched through Playwright with the flags the project's
 * browser tests use; Playwright's own browser downloads are never used.
 */
import { chromium } from '@playwright/test';

/** The Chromium flags of the project's browser tests. */
export const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
  '--disable-quic',
];

/** Launch headless Chromium (`CHROMIUM_PATH`, default /usr/bin/chromium). */
export function launchChromium() {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: CHROMIUM_ARGS,
  });
}

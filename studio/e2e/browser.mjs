// Launches Debian's Chromium through playwright-core (never a downloaded browser).
import { chromium } from 'playwright-core';

export const baseUrl = process.env.E2E_BASE_URL ?? `http://localhost:${process.env.PORT ?? 3000}`;

export function launchBrowser() {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
    ],
  });
}

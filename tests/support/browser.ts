import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { chromium, type Browser } from 'playwright-core';

export const screenshotDir = path.resolve(import.meta.dirname, '../e2e/screenshots');
mkdirSync(screenshotDir, { recursive: true });
export const shot = (name: string) => path.join(screenshotDir, `${name}.png`);

export const PHONE = { width: 390, height: 844 };
export const DESKTOP = { width: 1280, height: 860 };

/** Debian's Chromium, headless, with the flags that keep it off a closed network. */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run', '--disable-quic'],
  });
}

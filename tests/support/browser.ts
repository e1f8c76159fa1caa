import { mkdirSync, writeFileSync } from 'node:fs';
import QRCode from 'qrcode';
import { DEMO_PASSWORD } from '../../shared/constants';
import path from 'node:path';
import { chromium, type Browser } from 'playwright-core';

export const screenshotDir = path.resolve(import.meta.dirname, '../e2e/screenshots');
mkdirSync(screenshotDir, { recursive: true });
export const shot = (name: string) => path.join(screenshotDir, `${name}.png`);

export const PHONE = { width: 390, height: 844 };
export const DESKTOP = { width: 1280, height: 860 };

/** Debian's Chromium, headless, with the flags that keep it off a closed network. */
export function launchBrowser(extraArgs: string[] = []): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
      '--disable-quic',
      ...extraArgs,
    ],
  });
}

/**
 * A Y4M video of one QR code, for Chromium's fake camera (`--use-file-for-fake-video-capture`): black modules on
 * white, 4-module quiet zone, grey chroma.
 */
export function qrVideo(file: string, text: string, width = 640, height = 480) {
  const qr = QRCode.create(text, { errorCorrectionLevel: 'M' });
  const n = qr.modules.size;
  // Small enough to sit inside the scanner’s central scan region (two thirds of the shorter side).
  const scale = Math.floor((Math.min(width, height) * 0.55) / (n + 8));
  const x0 = Math.floor((width - n * scale) / 2);
  const y0 = Math.floor((height - n * scale) / 2);
  const y = Buffer.alloc(width * height, 235);
  for (let r = 0; r < n; r++)
    for (let c = 0; c < n; c++) {
      if (!qr.modules.get(r, c)) continue;
      for (let dy = 0; dy < scale; dy++)
        y.fill(
          16,
          (y0 + r * scale + dy) * width + x0 + c * scale,
          (y0 + r * scale + dy) * width + x0 + (c + 1) * scale,
        );
    }
  const chroma = Buffer.alloc((width / 2) * (height / 2) * 2, 128);
  const frame = Buffer.concat([Buffer.from('FRAME\n'), y, chroma]);
  writeFileSync(
    file,
    Buffer.concat([Buffer.from(`YUV4MPEG2 W${width} H${height} F10:1 Ip A1:1 C420jpeg\n`), ...Array(10).fill(frame)]),
  );
}

/** A fresh browser context signed in as a demo account (`organiser`, `fixer`, `host`, `admin`). */
export async function signedIn(
  browser: Browser,
  baseUrl: string,
  who: string,
  viewport: { width: number; height: number },
  locale?: string,
) {
  const context = await browser.newContext({ viewport, ...(locale ? { locale } : {}) });
  const page = await context.newPage();
  // The sign-in page speaks the browser's language; the labels below are English, so a foreign browser asks for it.
  await page.goto(`${baseUrl}/sign-in${locale && !locale.startsWith('en') ? '?lang=en' : ''}`);
  await page.getByLabel('E-mail').fill(`${who}@example.org`);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
  return { context, page };
}

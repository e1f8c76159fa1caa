import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { DEMO_PASSWORD } from '../../shared/constants';
import { launchBrowser, PHONE, shot } from '../support/browser';
import { startDemoApp, type DemoApp } from '../support/demo-app';

/*
 * Two journeys by keyboard alone (issue 12, WCAG 2.1.1 and 2.4.7): a visitor books a slot, a fixer opens an item
 * from their queue. Every control that takes the focus on the way must show that it has it.
 */

let app: DemoApp;
let browser: Browser;

beforeAll(async () => {
  app = await startDemoApp();
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

interface Focused {
  /** What a person would call the control: its role-ish tag and its name. */
  name: string;
  /** Why its focus can be seen, or null when it cannot. */
  indicator: string | null;
}

/**
 * The focused control and its focus indicator: an outline, or a box-shadow ring that the same element does not have
 * without the focus (measured on an unfocused copy beside it). A visually hidden radio or checkbox may show the focus
 * on its label instead.
 */
function focused(page: Page): Promise<Focused | null> {
  return page.evaluate(() => {
    const el = document.activeElement as HTMLElement | null;
    if (!el || el === document.body) return null;
    const visibleColour = (c: string) => !/^rgba\(.*,\s*0\)$/.test(c) && c !== 'transparent';
    const outline = (e: Element) => {
      const s = getComputedStyle(e);
      return s.outlineStyle !== 'none' && parseFloat(s.outlineWidth) >= 1 && visibleColour(s.outlineColor)
        ? `outline ${s.outlineWidth} ${s.outlineColor}`
        : null;
    };
    const ring = (e: Element) => {
      const shadow = getComputedStyle(e).boxShadow;
      if (shadow === 'none') return null;
      const copy = e.cloneNode(false) as HTMLElement;
      e.parentElement!.appendChild(copy);
      const unfocused = getComputedStyle(copy).boxShadow;
      copy.remove();
      const parts = shadow.split(/,(?![^(]*\))/).filter((p) => visibleColour(p.trim().split(/\)\s/)[0] + ')'));
      return parts.length && shadow !== unfocused ? `ring ${shadow}` : null;
    };
    const label = el instanceof HTMLInputElement ? el.labels?.[0] : undefined;
    const name =
      el.getAttribute('aria-label') ??
      label?.textContent ??
      (el instanceof HTMLInputElement || el instanceof HTMLSelectElement || el instanceof HTMLTextAreaElement
        ? (el.labels?.[0]?.textContent ?? el.name)
        : el.textContent);
    return {
      name: `${el.tagName.toLowerCase()}${el.getAttribute('type') ? `[${el.getAttribute('type')}]` : ''} "${(name ?? '').replace(/\s+/g, ' ').trim().slice(0, 100)}"`,
      indicator: outline(el) ?? ring(el) ?? (label ? (outline(label) ?? ring(label)) : null),
    };
  });
}

/**
 * Presses Tab (or Shift+Tab) until the focus is on a control whose name matches, checking the focus indicator of
 * every control passed on the way. Fails with the controls whose focus could not be seen.
 */
async function tabTo(page: Page, target: RegExp, opts: { back?: boolean; max?: number } = {}) {
  const unseen: string[] = [];
  const passed: string[] = [];
  for (let n = 0; n < (opts.max ?? 80); n++) {
    await page.keyboard.press(opts.back ? 'Shift+Tab' : 'Tab');
    const f = await focused(page);
    if (!f) continue;
    passed.push(f.name);
    if (!f.indicator) unseen.push(f.name);
    if (target.test(f.name)) {
      expect(unseen, `controls without a visible focus on the way to ${target}`).toEqual([]);
      return f;
    }
  }
  throw new Error(`${target} never took the focus; passed ${passed.join(', ')}; without a visible focus: ${unseen}`);
}

describe('by keyboard alone, with the focus always visible', () => {
  it('a visitor opens a session from the list and books a slot through to the confirmation', async () => {
    const page = await browser.newPage({ viewport: PHONE });
    await page.goto(`${app.server.url}/events`);
    await page
      .getByRole('link', { name: /Kestlebridge repair session/ })
      .first()
      .waitFor();

    const skip = await tabTo(page, /Skip to content/, { max: 1 });
    expect(skip.indicator).not.toBeNull();
    await tabTo(page, /^a ".*Kestlebridge repair session/);
    await page.keyboard.press('Enter');
    await page.getByRole('heading', { level: 1, name: 'Kestlebridge repair session' }).waitFor();

    await tabTo(page, /^a "Book a slot/);
    await page.keyboard.press('Enter');
    await page.getByRole('heading', { name: 'Book a repair slot' }).waitFor();

    // The first time that has room: the radio group takes the focus once, Space chooses it.
    await tabTo(page, /^input\[radio\] ".*free/);
    await page.keyboard.press('Space');
    await tabTo(page, /Your name/);
    await page.keyboard.type('Morwenna Pike');
    await tabTo(page, /^input\[email\] "E-mail/);
    await page.keyboard.type('morwenna@example.org');
    await tabTo(page, /^select "What is it\?/);
    await page.keyboard.type('Kettle');
    expect(await page.getByLabel('What is it?').evaluate((s: HTMLSelectElement) => s.selectedOptions[0].text)).toBe(
      'Kettle',
    );
    await tabTo(page, /What is wrong with it\?/);
    await page.keyboard.type('Clicks off before the water is hot.');
    await tabTo(page, /I accept the house rules/);
    await page.keyboard.press('Space');
    // Back up one control and forward again: Shift+Tab shows the focus too.
    await tabTo(page, /Photos/, { back: true });
    await tabTo(page, /I accept the house rules/);
    await tabTo(page, /^button(\[submit\])? "Book my slot/);
    await page.screenshot({ path: shot('keyboard-booking-submit') });
    await page.keyboard.press('Enter');
    await page.getByText('You are booked').waitFor({ timeout: 15_000 });
    await page.screenshot({ path: shot('keyboard-booking-confirmation'), fullPage: true });
    await page.close();
  });

  it('a fixer signs in and opens an item from My queue', async () => {
    const page = await browser.newPage({ viewport: PHONE });
    await page.goto(`${app.server.url}/sign-in`);
    await page.getByLabel('E-mail').waitFor();
    await tabTo(page, /^input\[email\] "E-mail/);
    await page.keyboard.type('fixer@example.org');
    await tabTo(page, /^input\[password\] "Password/);
    await page.keyboard.type(DEMO_PASSWORD);
    await page.keyboard.press('Enter');
    await page.waitForURL(`${app.server.url}/bench`);
    await page.getByRole('heading', { name: 'My queue' }).waitFor();

    const link = page.getByRole('region', { name: 'My queue' }).getByRole('link').first();
    const itemName = ((await link.textContent()) ?? '').replace(/\s+/g, ' ').trim().slice(0, 12);
    await tabTo(page, new RegExp(`^a "${itemName.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}`));
    await page.keyboard.press('Enter');
    await page.waitForURL(/\/items\/\d+$/);
    await page.getByRole('heading', { level: 1 }).waitFor();
    await tabTo(page, /Start repair|Safety check|Record the outcome/);
    await page.screenshot({ path: shot('keyboard-fixer-item') });
    await page.close();
  });
});

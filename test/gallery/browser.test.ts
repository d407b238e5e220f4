/**
 * The committed gallery page, opened from disk in Debian's Chromium (never a downloaded browser): it loads with
 * no console errors, every figure has a non-zero rendered size, and a screenshot is not blank.
 */
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { chromium, type BrowserContext } from 'playwright-core';

const CHROMIUM = '/usr/bin/chromium';
const PAGE = resolve('gallery/index.html');
const haveBrowser = existsSync(CHROMIUM);

describe.skipIf(!haveBrowser)('gallery/index.html in headless Chromium', () => {
  let browser: BrowserContext;
  let profile: string;

  beforeAll(async () => {
    profile = mkdtempSync(join(tmpdir(), 'conformark-chromium-'));
    browser = await chromium.launchPersistentContext(profile, {
      executablePath: CHROMIUM,
      headless: true,
      viewport: { width: 1280, height: 900 },
      args: [
        '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
        '--disable-background-networking', '--disable-component-update', '--disable-sync',
      ],
    });
  });

  afterAll(async () => {
    await browser?.close();
    rmSync(profile, { recursive: true, force: true });
  });

  it('loads with no console errors, renders every figure and is not blank', async () => {
    expect(existsSync(PAGE)).toBe(true);
    const page = await browser.newPage();
    const errors: string[] = [];
    page.on('console', (m) => {
      if (m.type() === 'error') errors.push(m.text());
    });
    page.on('pageerror', (e) => errors.push(e.message));
    await page.goto(pathToFileURL(PAGE).href, { waitUntil: 'load' });
    const sizes = await page.$$eval('figure img, figure svg, figure object', (els) =>
      els.map((el) => {
        const r = el.getBoundingClientRect();
        const img = el as HTMLImageElement;
        return { w: r.width, h: r.height, loaded: img.tagName !== 'IMG' || (img.complete && img.naturalWidth > 0) };
      }),
    );
    expect(sizes.length).toBeGreaterThan(5);
    for (const s of sizes) {
      expect(s.loaded).toBe(true);
      expect(s.w).toBeGreaterThan(10);
      expect(s.h).toBeGreaterThan(10);
    }
    const shot = await page.screenshot({ fullPage: false });
    // a blank page compresses to a tiny PNG; figures with lines and text do not
    expect(shot.byteLength).toBeGreaterThan(20_000);
    expect(errors).toEqual([]);
    await page.close();
  });
});

/**
 * The explorer page opened from disk in Debian's Chromium (never a downloaded browser): point at a bond, click
 * it and read the Newman figure, swap its ends, switch records with the bond kept, click a ring, sort, download
 * the SVG and compare it byte for byte with what the copied command writes. No console error, no request
 * beyond the page file itself.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { exploreFile, type ExploreModel } from '../../src/index.js';

const CHROMIUM = '/usr/bin/chromium';
const W2 = 'examples/w2-methylcyclohexanol.sdf';
const haveBrowser = existsSync(CHROMIUM);

describe.skipIf(!haveBrowser)('explore page in headless Chromium', () => {
  let browser: BrowserContext;
  let dir: string;
  let model: ExploreModel;
  let page: Page;
  const errors: string[] = [];
  const requests: string[] = [];
  let pageUrl: string;

  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'conformark-explore-'));
    const result = await exploreFile(W2);
    model = result.model;
    const file = join(dir, 'w2 <page>.html');
    writeFileSync(file, result.html);
    pageUrl = pathToFileURL(file).href;
    browser = await chromium.launchPersistentContext(join(dir, 'profile'), {
      executablePath: CHROMIUM,
      headless: true,
      acceptDownloads: true,
      viewport: { width: 1400, height: 900 },
      args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
    });
    page = await browser.newPage();
    page.on('console', (m) => {
      if (m.type() === 'error') errors.push(m.text());
    });
    page.on('pageerror', (e) => errors.push(e.message));
    page.on('request', (r) => requests.push(r.url()));
    await page.goto(pageUrl, { waitUntil: 'load' });
    // records are unpacked when first shown; the page marks the one it shows
    await page.waitForSelector(`body[data-shown="${model.rows[0]!.record}"]`);
  }, 120_000);

  afterAll(async () => {
    await browser?.close();
    rmSync(dir, { recursive: true, force: true });
  });

  const visible = '.depiction-box:not([hidden])';
  const figureSvg = () => page.$eval('#figure-box', (el) => el.innerHTML);
  /** The middle of a target on screen (a vertical bond's line has a zero-width box, which a locator calls invisible). */
  const middle = (selector: string) =>
    page.$eval(selector, (e) => {
      const r = e.getBoundingClientRect();
      return { x: r.x + r.width / 2, y: r.y + r.height / 2 };
    });

  it('lists every record and marks every bond and ring of the first as a target', async () => {
    expect(await page.$$eval('#record-body tr', (rows) => rows.length)).toBe(model.rows.length);
    const first = model.rows[0]!;
    const targets = await page.$$eval(`${visible} .bond-hit.target`, (els) => els.map((e) => e.getAttribute('data-bond')));
    expect(targets.sort()).toEqual(first.bonds.map((b) => b.key).sort());
    expect(await page.$$eval(`${visible} .ring-hit.target`, (els) => els.length)).toBe(first.rings.length);
  });

  it('hovering a bond shows its torsions; clicking it shows the exact Newman SVG with its torsion table', async () => {
    const row = model.rows[0]!;
    const ring = row.rings[0]!;
    const bond = row.bonds.find((b) => b.key === [ring.atoms[1]!, ring.atoms[2]!].sort((x, y) => x - y).join('-'))!;
    const at = await middle(`${visible} .bond-hit[data-bond="${bond.key}"]`);
    await page.mouse.move(at.x, at.y);
    const tip = await page.$eval('#tip', (el) => ({ hidden: (el as HTMLElement).hidden, text: el.textContent ?? '' }));
    expect(tip.hidden).toBe(false);
    expect(tip.text).toContain(bond.name);
    const heavy = bond.torsions.find((t) => t.heavy)!;
    expect(tip.text).toContain(heavy.label);
    await page.mouse.click(at.x, at.y);
    const view = bond.views[0]!;
    expect(await page.$$eval('#figure-box svg.newman', (els) => els.length)).toBe(1);
    // the browser re-serialises the SVG; its data-atoms and text are those of the embedded bytes
    const atoms = await page.$$eval('#figure-box svg [data-atoms]', (els) => els.map((e) => e.getAttribute('data-atoms')));
    expect(atoms).toEqual([...view.svg.matchAll(/data-atoms="([^"]+)"/g)].map((m) => m[1]));
    expect(await page.$eval('#figure-box svg title', (e) => e.textContent)).toBe(/<title[^>]*>([^<]*)<\/title>/.exec(view.svg)![1]);
    expect(await page.$eval('#command', (e) => e.textContent)).toBe(view.command);
    const angles = await page.$$eval('#figure-table tr', (rows) => rows.slice(1).map((r) => r.children[2]!.textContent));
    expect(angles).toEqual(bond.torsions.map((t) => t.angleDeg!.toFixed(1)));
    expect(await page.$eval('#figure-title', (e) => e.textContent)).toContain(`${view.front}→${view.back}`);
  });

  it('swapping front and back shows the other view of the same bond', async () => {
    const before = await figureSvg();
    await page.click('#flip');
    const title = await page.$eval('#figure-title', (e) => e.textContent ?? '');
    const [front, back] = /(\d+)→(\d+)/.exec(title)!.slice(1).map(Number);
    const bond = model.rows[0]!.bonds.find((b) => b.views[1]!.front === front && b.views[1]!.back === back)!;
    expect(bond).toBeDefined();
    expect(await figureSvg()).not.toBe(before);
    expect(await page.$eval('#command', (e) => e.textContent)).toBe(bond.views[1]!.command);
    await page.click('#flip');
  });

  it('choosing another record keeps the chosen bond and shows that record’s figure', async () => {
    const key = await page.$eval(`${visible} .bond-hit.selected`, (e) => e.getAttribute('data-bond'));
    const target = model.rows[3]!;
    await page.click(`#record-body tr[data-row="3"]`);
    await page.waitForSelector(`body[data-shown="${target.record}"]`);
    expect(await page.$eval(`${visible} .bond-hit.selected`, (e) => e.getAttribute('data-bond'))).toBe(key);
    const view = target.bonds.find((b) => b.key === key)!.views[0]!;
    expect(await page.$eval('#command', (e) => e.textContent)).toBe(view.command);
    expect(await page.$eval('#figure-box svg desc', (e) => e.textContent)).toBe(/<desc[^>]*>([^<]*)<\/desc>/.exec(view.svg)![1]!.replaceAll('&#39;', "'").replaceAll('&quot;', '"').replaceAll('&amp;', '&'));
    expect(await page.$eval('#record-body tr[aria-selected="true"]', (e) => e.getAttribute('data-row'))).toBe('3');
  });

  it('downloading the SVG gives the bytes the copied command writes', async () => {
    const command = (await page.$eval('#command', (e) => e.textContent)) ?? '';
    const [download] = await Promise.all([page.waitForEvent('download'), page.click('#download-svg')]);
    const saved = join(dir, 'downloaded.svg');
    await download.saveAs(saved);
    const words = command.split(' ');
    expect(words[0]).toBe('conformark');
    expect(download.suggestedFilename()).toBe(words[words.length - 1]);
    const out = join(dir, 'cli.svg');
    const r = spawnSync('node', ['bin/conformark.js', ...words.slice(1, -1), out], { encoding: 'utf8' });
    expect(r.status).toBe(0);
    expect(readFileSync(saved)).toEqual(readFileSync(out));
    await page.click('#copy-command');
    await page.waitForFunction(() => /copied|copy failed/.test(document.getElementById('status')!.textContent ?? ''));
  });

  it('clicking a ring shows its chair with shape and substituents', async () => {
    const row = model.rows[3]!;
    const ring = row.rings[0]!;
    const at = await middle(`${visible} .ring-hit[data-ring="${ring.key}"]`);
    await page.mouse.click(at.x, at.y);
    expect(await page.$$eval('#figure-box svg.chair', (els) => els.length)).toBe(1);
    expect(await page.$eval('#figure-summary', (e) => e.textContent)).toContain(ring.shape);
    expect(await page.$eval('#command', (e) => e.textContent)).toBe(ring.figure!.command);
    expect(await page.$$eval('#figure-table tr', (rows) => rows.length - 1)).toBe(ring.substituents.length);
  });

  it('sorting by ΔE puts the highest first on the second click', async () => {
    const header = page.locator('#record-head th[data-sort="relativeEnergy"]');
    await header.click();
    await header.click();
    const first = await page.$eval('#record-body tr', (e) => Number(e.getAttribute('data-row')));
    const highest = model.rows.reduce((best, r, i) => (r.relativeEnergy! > model.rows[best]!.relativeEnergy! ? i : best), 0);
    expect(first).toBe(highest);
  });

  it('made no console error and no request beyond the page file', () => {
    expect(errors).toEqual([]);
    expect(requests.filter((u) => u !== pageUrl && !u.startsWith('blob:'))).toEqual([]);
  });
});

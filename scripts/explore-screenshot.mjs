// Screenshot of the gallery's explorer page for the README: node scripts/explore-screenshot.mjs
// Opens gallery/w2-explore.html (npm run demo makes it) in Debian's Chromium, points at the C1–C2 bond of the
// second conformer and writes docs/explore-w2.png.
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { gunzipSync } from 'node:zlib';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { chromium } from 'playwright-core';

const page = resolve('gallery/w2-explore.html');
const out = resolve('docs/explore-w2.png');
if (!existsSync(page)) throw new Error(`${page} is missing: run npm run demo first`);
const profile = mkdtempSync(join(tmpdir(), 'conformark-shot-'));
const browser = await chromium.launchPersistentContext(profile, {
  executablePath: '/usr/bin/chromium',
  headless: true,
  viewport: { width: 1360, height: 760 },
  args: ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
});
try {
  const tab = await browser.newPage();
  await tab.goto(pathToFileURL(page).href, { waitUntil: 'load' });
  await tab.waitForSelector('body[data-shown]');
  await tab.click('#record-body tr[data-row="1"]');
  // the bond's key from the page's data (each record's bonds and rings are packed: gzip, base64)
  const html = readFileSync(page, 'utf8');
  const data = JSON.parse(/<script type="application\/json" id="explore-data">([\s\S]*?)<\/script>/.exec(html)[1]);
  await tab.waitForSelector(`body[data-shown="${data.rows[1].record}"]`);
  const { bonds } = JSON.parse(gunzipSync(Buffer.from(data.rows[1].detail, 'base64')).toString('utf8'));
  const key = bonds.find((b) => b.name === 'C1–C2' || b.name === 'C2–C1').key;
  // a vertical or horizontal line has a zero-width box, which the locator calls invisible: point at its middle
  const box = await tab.$eval(`.depiction-box:not([hidden]) .bond-hit[data-bond="${key}"]`, (e) => {
    const r = e.getBoundingClientRect();
    return { x: r.x + r.width / 2, y: r.y + r.height / 2 };
  });
  await tab.mouse.click(box.x, box.y);
  await tab.mouse.move(box.x + 1, box.y + 1);
  await tab.screenshot({ path: out });
  console.log(`wrote ${out}`);
} finally {
  await browser.close();
  rmSync(profile, { recursive: true, force: true });
}

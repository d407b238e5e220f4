/**
 * The explorer page: one self-contained HTML file (inline style, inline script, the data as JSON, the 2D
 * pictures as inline SVG). A Content-Security-Policy forbids every fetch, so the page cannot reach the network
 * even by mistake; the script is allowed by its hash only.
 */
import { createHash } from 'node:crypto';
import type { ExploreModel } from './exploreModel.js';
import { depictionSvg } from './depictionSvg.js';
import { escapeHtml, scriptJson } from './escapeHtml.js';
import { PAGE_SCRIPT } from './pageScript.js';
import { PAGE_STYLE } from './pageStyle.js';
import { packDetail } from './packDetail.js';

/** Options of {@link explorePage}. */
export interface ExplorePageOptions {
  /** Page title. Default: `conformark explorer: FILE`. */
  readonly title?: string;
}

/**
 * The HTML text of the explorer page for a model.
 * @example writeAtomic('page.html', explorePage(await exploreModel(mols, { file: 'w2.sdf' })))
 */
export function explorePage(model: ExploreModel, options: ExplorePageOptions = {}): string {
  const title = options.title ?? `conformark explorer: ${model.file}`;
  const { depictions, warnings: _warnings, ...rest } = model;
  // each record's bonds and rings travel packed (packDetail.ts); the rows keep what the record list shows
  const data = { ...rest, rows: model.rows.map(({ bonds, rings, ...row }) => ({ ...row, detail: row.embedded ? packDetail({ bonds, rings }) : null })) };
  const scriptHash = createHash('sha256').update(PAGE_SCRIPT, 'utf8').digest('base64');
  const csp = `default-src 'none'; style-src 'unsafe-inline'; img-src data: blob:; script-src 'sha256-${scriptHash}'; base-uri 'none'; form-action 'none'`;
  const embedded = model.rows.filter((r) => r.embedded).length;
  const meta = [
    `${model.rows.length} record${model.rows.length === 1 ? '' : 's'}`,
    model.ensemble ? `ranked by energy, populations at ${model.temperatureK} K` : 'file order',
    embedded < model.rows.length ? `${embedded} with figures` : null,
  ].filter((x) => x !== null);
  const notes = model.notes.map((n) => `<li${n === model.limitNote ? ' class="limit"' : ''}>${escapeHtml(n)}</li>`).join('\n');
  return [
    '<!DOCTYPE html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    `<meta http-equiv="Content-Security-Policy" content="${escapeHtml(csp)}">`,
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    '<meta name="generator" content="conformark explore">',
    `<title>${escapeHtml(title)}</title>`,
    `<style>${PAGE_STYLE}</style>`,
    '</head>',
    '<body>',
    `<header><h1>${escapeHtml(title)}</h1><p class="meta">${escapeHtml(meta.join(' · '))}</p></header>`,
    '<main>',
    '<section id="records" aria-label="records">',
    '<h2>Records</h2>',
    '<div class="records-scroll"><table id="record-table"><thead id="record-head"></thead><tbody id="record-body"></tbody></table></div>',
    `<ul class="notes">\n${notes}\n</ul>`,
    '</section>',
    '<section id="structure" aria-label="structure">',
    '<h2>Structure <span id="record-label"></span></h2>',
    '<div id="pictures">',
    ...depictions.map((d, k) => `<div class="depiction-box" data-depiction="${k}"${k === 0 ? '' : ' hidden'}>${depictionSvg(d)}</div>`),
    '</div>',
    '<p class="hint">Point at a bond for its torsions, or inside a ring for its shape; click (or Tab and Enter) to draw it. Grey tags are the chemical numbering, else the atom names or numbers of the file; a hover shows the atom numbers.</p>',
    '<div id="tip" role="tooltip" hidden></div>',
    '</section>',
    '<section id="figure" aria-label="figure">',
    '<h2 id="figure-title">Choose a bond or a ring</h2>',
    '<div class="tools">',
    '<button type="button" id="flip">Swap front and back</button>',
    '<button type="button" id="download-svg">Download SVG</button>',
    '<button type="button" id="download-png">Download PNG</button>',
    '<button type="button" id="copy-csv">Copy table as CSV</button>',
    '<button type="button" id="copy-command">Copy command</button>',
    '</div>',
    '<div id="figure-box"></div>',
    '<p id="figure-summary"></p>',
    '<code class="command" id="command"></code>',
    '<div id="status" aria-live="polite"></div>',
    '<table id="figure-table"></table>',
    '</section>',
    '</main>',
    `<script type="application/json" id="explore-data">${scriptJson(data)}</script>`,
    `<script>${PAGE_SCRIPT}</script>`,
    '</body>',
    '</html>',
    '',
  ].join('\n');
}

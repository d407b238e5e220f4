/**
 * The gallery's `index.html`: a plain page that shows every demo figure with its caption and links to the
 * tables. Static HTML with inline CSS; no scripts, no external resources, all text escaped.
 */

/** One figure on the page (path relative to the page). */
export interface GalleryFigure {
  readonly file: string;
  readonly caption: string;
  /** The figure's own width in pt; every figure is shown at the same scale, so type sizes match. */
  readonly widthPt?: number;
}

/** Screen pixels per figure pt on the page (1 pt = 4/3 px, shown half as large again). */
const PX_PER_PT = 2;

/** A link to a non-figure output (table, report). */
export interface GalleryLink {
  readonly file: string;
  readonly label: string;
}

/** One part of the scenario. */
export interface GallerySection {
  readonly id: string;
  readonly title: string;
  readonly text: string;
  readonly figures: readonly GalleryFigure[];
  readonly links: readonly GalleryLink[];
}

const escapeHtml = (text: string): string =>
  text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

const href = (file: string): string => escapeHtml(file.split('/').map(encodeURIComponent).join('/'));

const STYLE = `
  body { margin: 0; background: #f6f5f1; color: #1d1d1b; font: 15px/1.5 "DejaVu Sans", system-ui, sans-serif; }
  header, main, footer { max-width: 1180px; margin: 0 auto; padding: 0 24px; }
  header { padding-top: 28px; padding-bottom: 8px; }
  h1 { font-size: 26px; margin: 0 0 6px; letter-spacing: 0.01em; }
  h2 { font-size: 19px; margin: 36px 0 4px; border-bottom: 2px solid #1d1d1b; padding-bottom: 4px; }
  nav a { margin-right: 14px; }
  a { color: #1f4e8c; }
  .lead { max-width: 60em; margin: 4px 0 12px; }
  .grid { display: grid; grid-template-columns: repeat(auto-fill, minmax(340px, 1fr)); gap: 16px; margin-top: 12px; }
  figure { margin: 0; background: #ffffff; border: 1px solid #d9d6cc; border-radius: 6px; padding: 12px;
           display: flex; flex-direction: column; }
  figure img { display: block; max-width: 100%; height: auto; margin: auto; }
  figure.wide { grid-column: 1 / -1; }
  figcaption { font-size: 13px; margin-top: auto; padding-top: 10px; color: #3b3a36; }
  figcaption code { font-size: 12px; color: #6b6860; }
  ul.links { margin: 10px 0 0; padding-left: 20px; font-size: 14px; }
  footer { margin-top: 40px; padding-bottom: 40px; font-size: 13px; color: #55534c; }
`;

/** Sheets and plots read better across the whole row. */
const isWide = (file: string): boolean => /sheet|time-series|pucker-map/.test(file);

function figureHtml(f: GalleryFigure): string {
  return [
    `      <figure${isWide(f.file) ? ' class="wide"' : ''}>`,
    `        <img src="${href(f.file)}"${f.widthPt ? ` width="${Math.round(f.widthPt * PX_PER_PT)}"` : ''} alt="${escapeHtml(f.caption)}">`,
    `        <figcaption>${escapeHtml(f.caption)} <code>${escapeHtml(f.file)}</code></figcaption>`,
    '      </figure>',
  ].join('\n');
}

function sectionHtml(s: GallerySection): string {
  const links = s.links.length === 0
    ? ''
    : `\n    <ul class="links">\n${s.links.map((l) => `      <li><a href="${href(l.file)}">${escapeHtml(l.label)}</a> <code>${escapeHtml(l.file)}</code></li>`).join('\n')}\n    </ul>`;
  return [
    `  <section id="${escapeHtml(s.id)}">`,
    `    <h2>${escapeHtml(s.title)}</h2>`,
    `    <p class="lead">${escapeHtml(s.text)}</p>`,
    '    <div class="grid">',
    ...s.figures.map(figureHtml),
    `    </div>${links}`,
    '  </section>',
  ].join('\n');
}

/**
 * The gallery page for the given sections.
 * @example writeFileSync('gallery/index.html', galleryPage(sections))
 */
export function galleryPage(sections: readonly GallerySection[]): string {
  const nav = sections.map((s) => `<a href="#${escapeHtml(s.id)}">${escapeHtml(s.title.split(' · ')[0]!)}</a>`).join('');
  return `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>conformark demo gallery: the Wren route</title>
<style>${STYLE}</style>
</head>
<body>
<header>
  <h1>The Wren route: conformations for the supporting information</h1>
  <p class="lead">An invented synthesis whose intermediates include a substituted cyclohexane, a pyranoside and a
  five-membered ring, plus a synthetic run of one ring's motion. Every structure was generated with
  <code>conformark build</code> (openchemlib + MMFF94s) and every figure and table below was drawn by
  <code>conformark demo</code> from those files; nothing was drawn by hand.</p>
  <nav>${nav}</nav>
</header>
<main>
${sections.map(sectionHtml).join('\n')}
</main>
<footer>
  Figures are only as good as the input structure. MMFF94s energies and predicted ³J(H,H) couplings are estimates
  (couplings: typical error about 1 Hz); populations from energies ignore entropy. The ring walk is a scripted,
  synthetic path, not a simulation.
</footer>
</body>
</html>
`;
}

/**
 * Supporting-information tables as CSV, Markdown and LaTeX (booktabs). Numbers are formatted once, here,
 * with a fixed number of decimals per column, so the same data always gives the same text. No siunitx:
 * LaTeX cells are plain numbers (negative signs typeset as `$-$`).
 */
import { safeText } from '../../layout/text/safeText.js';

/** A cell: text, a number (formatted with the column's digits) or `null` (no value). */
export type TableCell = string | number | null;

/** One column: machine name (CSV header), human headers with units, decimals for numbers. */
export interface TableColumn {
  /** CSV header, e.g. `angleDeg`. */
  readonly key: string;
  /** Markdown header with unit, e.g. `torsion (°)`. */
  readonly label: string;
  /** LaTeX header (already LaTeX), e.g. `torsion (\\textdegree)`. Default: `label`, escaped. */
  readonly tex?: string;
  /** Decimals of numeric cells. Default 0 (whole numbers are written as they are). */
  readonly digits?: number;
}

/** A table ready to write in any format. */
export interface Table {
  /** File stem and manifest kind, e.g. `torsions`. */
  readonly kind: string;
  /** One-sentence caption (LaTeX `\caption`, Markdown heading). */
  readonly caption: string;
  readonly columns: readonly TableColumn[];
  readonly rows: readonly (readonly TableCell[])[];
}

/** Table text formats. */
export const TABLE_FORMATS = new Map([
  ['csv', 'comma-separated values, RFC 4180 quoting, machine headers'],
  ['md', 'Markdown pipe table with units in the headers'],
  ['tex', 'LaTeX tabular with booktabs rules'],
] as const);
export type TableFormat = typeof TABLE_FORMATS extends Map<infer K, unknown> ? K : never;

/** A number with fixed decimals, never `-0`. */
export function fixed(value: number, digits: number): string {
  const text = value.toFixed(digits);
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
}

function cellText(cell: TableCell, column: TableColumn): string | null {
  if (cell === null) return null;
  return typeof cell === 'number' ? fixed(cell, column.digits ?? 0) : cell;
}

/**
 * One CSV field, quoted when needed. Text that a spreadsheet would run as a formula (starting with `=` or `@`,
 * or with `+`/`-` and containing a call or pipe such as `+cmd|…` or `-HYPERLINK(…)`) gets a leading apostrophe;
 * numbers and the Klyne–Prelog labels `+sc`, `-ac` stay as they are (common practice, no source).
 */
const csvField = (text: string) => {
  const formula = /^[=@]/.test(text) || (/^[+-]/.test(text) && /[()!|=]/.test(text) && !Number.isFinite(Number(text)));
  const safe = formula ? `'${text}` : text;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
};

/** CSV: header of column keys, one line per row, empty field for no value, `\n` line ends. */
export function tableCsv(table: Table): string {
  const lines = [table.columns.map((c) => csvField(c.key)).join(',')];
  for (const row of table.rows) lines.push(table.columns.map((c, i) => csvField(cellText(row[i] ?? null, c) ?? '')).join(','));
  return `${lines.join('\n')}\n`;
}

// Markdown renderers pass raw HTML through: `<` and `>` become entities, controls and bidi overrides U+FFFD
const mdField = (text: string) =>
  safeText(text, Number.POSITIVE_INFINITY).text.replace(/\\/g, '\\\\').replace(/\|/g, '\\|').replace(/</g, '&lt;').replace(/>/g, '&gt;');

/** Markdown: caption as a bold line, pipe table, numbers right-aligned, `–` for no value. */
export function tableMarkdown(table: Table): string {
  const numeric = table.columns.map((_, i) => table.rows.some((r) => typeof r[i] === 'number'));
  const head = `| ${table.columns.map((c) => mdField(c.label)).join(' | ')} |`;
  const rule = `|${numeric.map((n) => (n ? ' ---: ' : ' :--- ')).join('|')}|`;
  const body = table.rows.map((r) => `| ${table.columns.map((c, i) => mdField(cellText(r[i] ?? null, c) ?? '–')).join(' | ')} |`);
  return `**${mdField(table.caption)}**\n\n${[head, rule, ...body].join('\n')}\n`;
}

const TEX_ESCAPES: Record<string, string> = {
  '\\': '\\textbackslash{}', '&': '\\&', '%': '\\%', $: '\\$', '#': '\\#', _: '\\_', '{': '\\{', '}': '\\}',
  '~': '\\textasciitilde{}', '^': '\\textasciicircum{}', '−': '$-$', '°': '\\textdegree{}', 'Å': '\\AA{}',
};

/** Escapes text for LaTeX: the ten special characters, plus −, ° and Å as commands. */
export function texEscape(text: string): string {
  return text.replace(/[\\&%$#_{}~^−°Å]/g, (ch) => TEX_ESCAPES[ch]!).replace(/[\r\n]+/g, ' ');
}

function texCell(cell: TableCell, column: TableColumn): string {
  const text = cellText(cell, column);
  if (text === null) return '--';
  if (typeof cell === 'number') return text.startsWith('-') ? `$-$${text.slice(1)}` : text;
  return texEscape(text);
}

/** LaTeX: a `table` float with caption and label, `tabular` with \toprule, \midrule, \bottomrule. */
export function tableLatex(table: Table): string {
  const numeric = table.columns.map((_, i) => table.rows.some((r) => typeof r[i] === 'number'));
  const spec = numeric.map((n) => (n ? 'r' : 'l')).join('');
  const lines = [
    '% requires \\usepackage{booktabs}',
    '\\begin{table}',
    '\\centering',
    `\\caption{${texEscape(table.caption)}}`,
    `\\label{tab:${table.kind}}`,
    `\\begin{tabular}{${spec}}`,
    '\\toprule',
    `${table.columns.map((c) => c.tex ?? texEscape(c.label)).join(' & ')} \\\\`,
    '\\midrule',
    ...table.rows.map((r) => `${table.columns.map((c, i) => texCell(r[i] ?? null, c)).join(' & ')} \\\\`),
    '\\bottomrule',
    '\\end{tabular}',
    '\\end{table}',
  ];
  return `${lines.join('\n')}\n`;
}

/** Text of a table in a format. */
export const TABLE_WRITERS: ReadonlyMap<TableFormat, (t: Table) => string> = new Map([
  ['csv', tableCsv],
  ['md', tableMarkdown],
  ['tex', tableLatex],
]);

/** The explorer page's stylesheet (inline; system fonts only, no external resource). Our own look. */
export const PAGE_STYLE = `
:root { --ink: #1d232b; --muted: #5b6672; --line: #d5dbe1; --soft: #f3f5f7; --accent: #0b6e99; --pick: #c2410c; }
* { box-sizing: border-box; }
body { margin: 0; font: 14px/1.45 system-ui, -apple-system, "Segoe UI", "DejaVu Sans", sans-serif; color: var(--ink); background: #fff; }
header { padding: 12px 20px; border-bottom: 1px solid var(--line); display: flex; align-items: baseline; gap: 16px; flex-wrap: wrap; }
header h1 { font-size: 18px; margin: 0; font-weight: 600; }
header .meta { color: var(--muted); margin: 0; }
main { display: grid; grid-template-columns: minmax(300px, 0.95fr) minmax(340px, 1.15fr) minmax(380px, 1.25fr); gap: 0; min-height: calc(100vh - 50px); }
main > section { padding: 12px 16px; border-right: 1px solid var(--line); min-width: 0; }
main > section:last-child { border-right: none; }
h2 { font-size: 13px; text-transform: uppercase; letter-spacing: .05em; color: var(--muted); margin: 0 0 8px; font-weight: 600; }
table { border-collapse: collapse; width: 100%; font-variant-numeric: tabular-nums; }
th, td { padding: 3px 6px; text-align: left; border-bottom: 1px solid var(--line); white-space: nowrap; }
td.num, th.num { text-align: right; }
#record-table th { cursor: pointer; user-select: none; position: sticky; top: 0; background: #fff; }
#record-table th[aria-sort="ascending"]::after { content: " ▲"; font-size: 9px; }
#record-table th[aria-sort="descending"]::after { content: " ▼"; font-size: 9px; }
#record-table tbody tr { cursor: pointer; }
#record-table tbody tr:hover { background: var(--soft); }
#record-table tbody tr[aria-selected="true"] { background: #dcecf4; }
#record-table tbody tr.summarised td { color: var(--muted); }
td.shapes { white-space: normal; }
#record-table th { white-space: normal; vertical-align: bottom; }
td.title { max-width: 8em; overflow: hidden; text-overflow: ellipsis; }
#record-table { font-size: 13px; }
.records-scroll { max-height: 60vh; overflow: auto; border: 1px solid var(--line); }
.notes { color: var(--muted); font-size: 12px; padding-left: 18px; }
.notes li.limit { color: var(--pick); }
.depiction-box { position: relative; overflow: auto; }
svg.depiction { display: block; margin: 0 auto; max-width: 100%; height: auto; }
svg.depiction .bond { stroke: var(--ink); stroke-width: 1.6; stroke-linecap: round; }
svg.depiction .bond.aromatic { stroke-dasharray: 5 2; }
svg.depiction .label-bg { fill: #fff; }
svg.depiction .label-bg, svg.depiction .atom, svg.depiction .tag { pointer-events: none; }
svg.depiction .atom { font-size: 13px; text-anchor: middle; fill: var(--ink); font-weight: 600; }
svg.depiction .tag { font-size: 9.5px; text-anchor: middle; fill: var(--muted); }
svg.depiction .bond-hit { stroke: transparent; stroke-width: 12; stroke-linecap: round; }
svg.depiction .ring-hit { fill: transparent; }
svg.depiction .target { cursor: pointer; }
svg.depiction .bond-hit.target:hover, svg.depiction .bond-hit.target:focus { stroke: rgba(11, 110, 153, .28); outline: none; }
svg.depiction .ring-hit.target:hover, svg.depiction .ring-hit.target:focus { fill: rgba(11, 110, 153, .10); outline: none; }
svg.depiction .bond-hit.selected { stroke: rgba(194, 65, 12, .45); }
svg.depiction .ring-hit.selected { fill: rgba(194, 65, 12, .12); }
#tip { position: fixed; pointer-events: none; background: var(--ink); color: #fff; padding: 6px 8px; border-radius: 4px; font-size: 12px; max-width: 360px; white-space: pre-line; z-index: 5; }
.hint { color: var(--muted); font-size: 12px; }
.tools { display: flex; flex-wrap: wrap; gap: 6px; margin: 6px 0 10px; }
button { font: inherit; font-size: 12.5px; padding: 4px 9px; border: 1px solid var(--line); border-radius: 4px; background: var(--soft); color: var(--ink); cursor: pointer; }
button:hover { border-color: var(--accent); }
button:disabled { opacity: .45; cursor: default; }
#figure-box { min-height: 120px; display: flex; justify-content: center; align-items: center; padding: 8px; border: 1px solid var(--line); border-radius: 4px; }
#figure-box svg { max-width: 100%; height: auto; width: 320px; }
#figure-box p { color: var(--muted); margin: 0; }
.command { display: block; margin: 8px 0; padding: 6px 8px; background: var(--soft); border-radius: 4px; font: 12px/1.4 ui-monospace, "DejaVu Sans Mono", monospace; white-space: pre-wrap; word-break: break-all; }
.command:empty { display: none; }
#status { color: var(--accent); font-size: 12px; min-height: 1.4em; }
#figure-table { font-size: 12.5px; }
#figure-table th { white-space: normal; vertical-align: bottom; }
#figure-summary { margin: 8px 0 0; font-weight: 600; }
#figure-table caption { text-align: left; font-weight: 600; padding: 6px 0 3px; }
@media (max-width: 1000px) { main { grid-template-columns: 1fr; } main > section { border-right: none; border-bottom: 1px solid var(--line); } }
`;

// The report page's style sheet: inline, no web fonts, readable on screen and on paper.

export const REPORT_CSS = `
:root { --ink: #1d1d1f; --muted: #6b6b70; --rule: #d9d9de; --good: #2e7d32; --bad: #c62828; --warn: #a66300; --accent: #1f5fa8; }
* { box-sizing: border-box; }
body { font-family: system-ui, -apple-system, "Segoe UI", Roboto, "Helvetica Neue", Arial, sans-serif; color: var(--ink); margin: 1.5rem auto; max-width: 90rem; padding: 0 1.25rem; line-height: 1.45; background: #fff; }
h1 { font-size: 1.6rem; margin: 0 0 .25rem; }
h2 { font-size: 1.2rem; margin: 2rem 0 .5rem; border-top: 1px solid var(--rule); padding-top: 1rem; }
.meta, .note { color: var(--muted); font-size: .9rem; }
.note { border-left: 3px solid var(--warn); padding: .25rem .75rem; background: #fff8ec; color: var(--ink); }
.summary span { margin-right: 1.25rem; }
table { border-collapse: collapse; width: 100%; font-size: .85rem; margin-top: 1rem; }
th, td { text-align: left; vertical-align: top; padding: .35rem .5rem; border-bottom: 1px solid var(--rule); }
th { font-weight: 600; background: #f5f5f7; }
td.id code { font-weight: 600; }
td.statement { min-width: 14rem; }
td.id code { white-space: nowrap; }
td.id .meta { font-size: .75rem; overflow-wrap: anywhere; }
td.exhaustive, td.sampled { min-width: 8rem; }
td.records { font-size: .8rem; color: var(--muted); white-space: nowrap; }
.outcome { font-weight: 600; white-space: nowrap; }
.agrees { color: var(--good); }
.disagrees { color: var(--bad); }
.unknown { color: var(--muted); }
.sampled-text { color: var(--warn); }
.legend svg, td.bar svg { vertical-align: middle; }
.legend { font-size: .85rem; color: var(--muted); margin-top: .5rem; }
.legend span { margin-right: 1rem; }
code { font-family: ui-monospace, "SFMono-Regular", Menlo, Consolas, monospace; font-size: .85em; background: #f5f5f7; padding: 0 .2em; border-radius: 3px; word-break: break-word; }
figure { display: inline-block; margin: .5rem 1.5rem .5rem 0; vertical-align: top; }
figcaption { font-size: .8rem; color: var(--muted); max-width: 24rem; }
dl { display: grid; grid-template-columns: max-content 1fr; gap: .25rem 1rem; }
dt { font-weight: 600; }
dd { margin: 0; }
.recheck-ok { color: var(--good); }
.recheck-bad { color: var(--bad); font-weight: 600; }
a { color: var(--accent); }
@media print {
  body { margin: 0; max-width: none; font-size: 10pt; }
  a { color: inherit; text-decoration: none; }
  section.counterexample { break-inside: avoid; }
  th { background: none; }
  .note { background: none; }
}
`;

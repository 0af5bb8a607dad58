/** Styles of the preview page (kept in code so the page needs no extra loader or file). */
export const PREVIEW_CSS = `
:root { --ink: #1d2731; --muted: #4a5866; --line: #c9d2da; --head: #e9eef2; --accent: #24587a;
  --spill: #f3ecdb; --spill-anchor: #eadcb8; --error: #9a1b1b; --select: #dbe8f4; --focus: #24587a; }
* { box-sizing: border-box; }
[hidden] { display: none !important; }
.visually-hidden { position: absolute; width: 1px; height: 1px; overflow: hidden; clip: rect(0 0 0 0); white-space: nowrap; }
body { margin: 0; font: 14px/1.4 system-ui, "Segoe UI", Roboto, Arial, sans-serif; color: var(--ink); background: #f7f9fa; }
.page-head { padding: 10px 16px 6px; border-bottom: 1px solid var(--line); background: #fff; }
.page-head h1 { font-size: 20px; margin: 0; color: var(--accent); }
.page-sub { margin: 2px 0; color: var(--muted); }
.demo-notice { margin: 4px 0 0; padding: 4px 8px; background: #fff6d8; border: 1px solid #e2cf8d; border-radius: 4px; font-size: 13px; }
.page-main { display: flex; gap: 12px; padding: 10px 16px; align-items: flex-start; }
.workbook-area { flex: 1 1 auto; min-width: 0; background: #fff; border: 1px solid var(--line); border-radius: 4px; }
.panel-area { flex: 0 0 380px; max-height: calc(100vh - 110px); overflow: auto; background: #fff; border: 1px solid var(--line); border-radius: 4px; }
.loading { padding: 16px; }
.formula-bar { display: flex; align-items: center; gap: 8px; padding: 6px 8px; border-bottom: 1px solid var(--line); }
.cell-name { min-width: 130px; font: 13px ui-monospace, Consolas, monospace; padding: 3px 6px; border: 1px solid var(--line); border-radius: 3px; background: #fbfcfd; }
.formula-label { color: var(--muted); font-size: 13px; }
.cell-contents { flex: 1; font: 13px ui-monospace, Consolas, monospace; padding: 4px 6px; border: 1px solid var(--line); border-radius: 3px; }
.cell-contents.spilled { color: var(--muted); background: #f4f4f0; }
.cell-note { margin: 0; min-height: 22px; padding: 2px 10px; font-size: 13px; color: var(--muted); border-bottom: 1px solid var(--line); }
.cell-note.error { color: var(--error); }
.sheet-panel { outline: none; }
.grid-scroll { overflow: auto; max-height: calc(100vh - 250px); min-height: 320px; }
.grid { border-collapse: separate; border-spacing: 0; table-layout: fixed; font-size: 13px; }
.grid th { background: var(--head); color: #27323c; font-weight: 600; font-size: 12px; border-right: 1px solid var(--line); border-bottom: 1px solid var(--line); padding: 0 4px; position: sticky; }
.grid thead th { top: 0; z-index: 3; height: 22px; cursor: s-resize; }
.grid th.row-head { left: 0; z-index: 2; text-align: right; }
.grid th.corner { left: 0; z-index: 4; }
.grid td { height: 22px; padding: 0 4px; border-right: 1px solid #e3e8ec; border-bottom: 1px solid #e3e8ec; white-space: nowrap; overflow: hidden; text-overflow: ellipsis; cursor: cell; position: relative; }
.grid td.k-number { text-align: right; font-variant-numeric: tabular-nums; }
.grid td.k-error { color: var(--error); font-weight: 600; text-align: center; background: #fbeeee; }
.grid td.overflow { overflow: visible; text-overflow: clip; z-index: 1; }
.grid td .overflow-text { display: inline-block; vertical-align: top; overflow: hidden; text-overflow: ellipsis; white-space: nowrap; }
.grid td.spill-part { background: var(--spill); }
.grid td.spill-anchor { background: var(--spill-anchor); box-shadow: inset 3px 0 0 #b48b2f; }
.grid td.in-selection { background-image: linear-gradient(rgba(36, 88, 122, 0.14), rgba(36, 88, 122, 0.14)); }
.grid td.active { outline: 2px solid var(--focus); outline-offset: -2px; }
.grid td:focus { outline: 2px solid var(--focus); outline-offset: -2px; }
.grid td.editing { padding: 0; overflow: visible; z-index: 5; }
.cell-editor { position: absolute; inset: 0 auto 0 0; min-width: 100%; width: 260px; height: 100%; font: 13px ui-monospace, Consolas, monospace; border: 2px solid var(--focus); padding: 0 3px; }
.grid td.role-title { font-weight: 700; font-size: 15px; color: #23404a; }
.grid td.role-subtitle, .grid td.role-explain, .grid td.role-linked { font-style: italic; color: #4a5f69; }
.grid td.role-heading { font-weight: 700; color: #23404a; }
.grid td.role-header { font-weight: 700; color: #23404a; background: #dde7e4; white-space: normal; overflow-wrap: anywhere; line-height: 1.2; padding: 2px 4px; vertical-align: bottom; }
.grid td.role-header .overflow-text { white-space: normal; }
.grid td.role-input { font-weight: 700; background: #fbefc8; }
.grid td.role-written { color: #595959; }
.grid td.role-actual { background: #eef3f7; }
.grid td.role-start, .grid td.role-linked { background: #f2f2f6; }
.grid td.role-result { font-weight: 700; }
.grid td.role-engine { font-style: italic; color: #5c3f85; }
.grid td.flagged { background: #f6c9c0; color: #7a1f14; font-weight: 700; }
.grid td.has-note::after { content: ""; position: absolute; top: 0; right: 0; border: 4px solid transparent; border-top-color: #b48b2f; border-right-color: #b48b2f; }
.sheet-tabs { display: flex; gap: 2px; padding: 4px 8px; overflow-x: auto; border-top: 1px solid var(--line); background: var(--head); }
.sheet-tab { white-space: nowrap; flex: 0 0 auto; border: 1px solid var(--line); border-top: none; background: #f4f6f8; padding: 4px 14px; font: inherit; color: var(--ink); cursor: pointer; border-radius: 0 0 4px 4px; }
.sheet-tab[aria-selected="true"] { background: #fff; color: var(--accent); font-weight: 600; }
.sheet-tab:focus-visible, .cell-contents:focus-visible { outline: 2px solid var(--focus); outline-offset: 1px; }
.ledger-chart { padding: 8px 12px; border-top: 1px solid var(--line); }
.ledger-chart h2 { font-size: 15px; margin: 0 0 4px; }
.ledger-chart .chart-box { position: relative; height: 260px; }
@media (max-width: 1000px) { .page-main { flex-direction: column; } .panel-area { flex-basis: auto; width: 100%; max-height: none; } }
`;

import { cellAddress, rangeAddress, sheetReference } from "./addresses";
import { abs, nm, type SectionContext } from "./context";
import { SECTION, SETTING_ROWS, SETTINGS_HEADER, SETTINGS_NOTES, UNUSED } from "./labels";
import { SETTING_KEYS } from "./layout";
import { shownCycles } from "./engineFigures";
import { guardFlags, settingGuardFormula } from "./settingsGuard";
import { FORMAT } from "./sheet";
import type { CellKind, CellValue, SettingKey, StyleRole, TextFlag } from "./types";

/** Section 1: the settings as named cells, with the values when written beside them. */
export function settingsSection(ctx: SectionContext): { inUse: Record<SettingKey, string>; written: Record<SettingKey, string>; flags: TextFlag[] } {
  const { g, cells, f } = ctx;
  const c0 = g.c0;
  const spec = f.model.spec;
  const k = f.model.constants;
  cells.text(g.settings.heading, c0, SECTION.settings, "heading");
  cells.text(g.settings.header, c0, SETTINGS_HEADER.label, "header");
  cells.text(g.settings.header, c0 + 1, SETTINGS_HEADER.inUse, "header", SETTINGS_NOTES.inUse);
  cells.text(g.settings.header, c0 + 2, SETTINGS_HEADER.written, "header", SETTINGS_NOTES.written);
  cells.text(g.settings.header, c0 + 3, SETTINGS_HEADER.explain, "header");

  const hasTrend = spec.trend !== "none";
  const damped = spec.trend === "damped";
  const values: Record<SettingKey, { value: CellValue; kind: CellKind; format?: string; explain?: string }> = {
    name: { value: ctx.name, kind: "constant" },
    alpha: { value: k.alpha, kind: "setting", format: FORMAT.constant },
    beta: { value: k.beta, kind: "setting", format: FORMAT.constant, explain: hasTrend ? undefined : UNUSED.beta },
    gamma: { value: k.gamma, kind: "setting", format: FORMAT.constant, explain: f.seasonal ? undefined : UNUSED.gamma },
    phi: { value: k.phi, kind: damped ? "setting" : "fixed-setting", format: FORMAT.constant, explain: damped ? undefined : UNUSED.phi },
    season: { value: f.p, kind: "fixed-setting", format: FORMAT.count },
    seasonality: { value: spec.seasonality, kind: "fixed-setting" },
    trend: { value: spec.trend, kind: "fixed-setting" },
    start: { value: spec.start, kind: "fixed-setting" },
    cycles: { value: shownCycles(f.model.shape), kind: "fixed-setting", format: FORMAT.count },
    horizon: { value: ctx.horizon, kind: "fixed-setting", format: FORMAT.count },
    coverage: { value: ctx.coverage, kind: "setting", format: FORMAT.coverage },
    tag: { value: `ebb_${ctx.tag}_`, kind: "fixed-setting" },
  };
  const inUse = {} as Record<SettingKey, string>;
  const written = {} as Record<SettingKey, string>;
  for (const key of SETTING_KEYS) {
    const row = g.settings.rows[key];
    const v = values[key];
    const text = SETTING_ROWS[key];
    cells.text(row, c0, text.label, "label");
    const role: StyleRole = v.kind === "setting" ? "input" : "label";
    cells.put(row, c0 + 1, v.kind, role, v.value, v.format ? { format: v.format } : {});
    cells.put(row, c0 + 2, "constant", "written", v.value, v.format ? { format: v.format } : {});
    inUse[key] = cellAddress(row, c0 + 1);
    written[key] = cellAddress(row, c0 + 2);
    const explain = v.explain ?? text.explain;
    const guard = settingGuardFormula(key, v.kind === "setting", inUse[key], written[key], explain);
    if (guard) cells.formula(row, c0 + 3, guard, explain, "General", "explain");
    else cells.text(row, c0 + 3, explain, "explain");
    ctx.names.push({ name: nm(ctx, key), refersTo: sheetReference(ctx.sheet, abs(row, c0 + 1)), comment: `Ebb ledger setting: ${text.label}` });
  }
  const settingRows = SETTING_KEYS.map((key) => g.settings.rows[key]);
  const explainColumn = rangeAddress(Math.min(...settingRows), c0 + 3, Math.max(...settingRows), c0 + 3);
  return { inUse, written, flags: guardFlags(explainColumn) };
}

import { OfficeMockObject } from "office-addin-mock";

/**
 * A stand-in for the Excel JavaScript API, built on office-addin-mock: the objects whose
 * properties the adapter loads (the sheet's existence, the used range, an old chart) are
 * OfficeMockObjects, so reading them before load and sync fails as in a real host. Every
 * write is recorded with the number of syncs made before it, to check batching.
 */
export interface Call {
  what: string;
  args: unknown[];
  /** Syncs completed when the call was made. */
  afterSyncs: number;
}

export interface FakeExcelOptions {
  sheetExists: boolean;
  /** Content found in the destination (the used range of the footprint). */
  occupied?: { rowIndex: number; columnIndex: number; formulas: (string | number)[][] };
  existingNames?: string[];
}

/** Calls that send something to the host: their arguments make up the request of the next sync. */
const SENDS = /^(range\.|format@|fill@|font@|names\.add|names\.delete|merge|clear|conditionalFormats|charts\.add|chart\.|notes\.add|comments\.add|worksheets\.add)/;

export interface FakeExcel {
  Excel: { run: (cb: (context: unknown) => Promise<unknown>) => Promise<unknown> };
  calls: Call[];
  syncs: () => number;
  /** Properties assigned to ranges, by address: e.g. ranges.get("A1:N120").formulas. */
  ranges: Map<string, Record<string, unknown>>;
  /** Size in characters (JSON) of what each sync sent: the arguments of the calls made before it. */
  requestSizes: () => number[];
}

export function fakeExcel(options: FakeExcelOptions): FakeExcel {
  const calls: Call[] = [];
  let syncs = 0;
  const record = (what: string, ...args: unknown[]) => calls.push({ what, args, afterSyncs: syncs });
  const ranges = new Map<string, Record<string, unknown>>();

  const sheetState = new OfficeMockObject({ isNullObject: !options.sheetExists });
  const used = new OfficeMockObject(
    options.occupied ? { isNullObject: false, formulas: options.occupied.formulas, rowIndex: options.occupied.rowIndex, columnIndex: options.occupied.columnIndex } : { isNullObject: true, formulas: [], rowIndex: 0, columnIndex: 0 },
  );
  const oldChart = new OfficeMockObject({ isNullObject: true });

  const makeRange = (address: string) => {
    const props: Record<string, unknown> = {};
    ranges.set(address, props);
    const format = recorder(`format@${address}`, { fill: recorder(`fill@${address}`, {}, record), font: recorder(`font@${address}`, {}, record) }, record);
    const range = {
      format,
      conditionalFormats: {
        add: (type: string) => {
          record("conditionalFormats.add", address, type);
          const cf = { custom: { format: { fill: {}, font: {} }, rule: {} as Record<string, unknown> }, cellValue: { format: { fill: {}, font: {} }, rule: undefined as unknown }, textComparison: { format: { fill: {}, font: {} }, rule: undefined as unknown } };
          props.conditionalFormat = cf;
          return cf;
        },
      },
      merge: (across: boolean) => record("merge", address, across),
      clear: (what: string) => record("clear", address, what),
      getUsedRangeOrNullObject: () => {
        record("getUsedRangeOrNullObject", address);
        return used;
      },
    };
    return new Proxy(range as Record<string, unknown>, {
      set(target, prop, value) {
        record(`range.${String(prop)}`, address, value);
        props[String(prop)] = value;
        target[String(prop)] = value;
        return true;
      },
    });
  };

  const sheet = {
    load: (p: string) => sheetState.load(p),
    get isNullObject() {
      return (sheetState as unknown as { isNullObject: boolean }).isNullObject;
    },
    getRange: (address: string) => {
      record("getRange", address);
      return makeRange(address);
    },
    charts: {
      getItemOrNullObject: (name: string) => {
        record("charts.getItemOrNullObject", name);
        return oldChart;
      },
      add: (type: string, _source: unknown, seriesBy: string) => {
        record("charts.add", type, seriesBy);
        const series: { name?: string; x?: unknown; y?: unknown }[] = [{}];
        const make = (s: { name?: string; x?: unknown; y?: unknown }) => ({
          set name(v: string) {
            s.name = v;
          },
          setXAxisValues: (r: unknown) => (s.x = r),
          setValues: (r: unknown) => (s.y = r),
        });
        const chart = {
          name: "",
          title: { text: "" },
          series: {
            getItemAt: (i: number) => make(series[i]),
            add: (name: string) => {
              const s = { name };
              series.push(s);
              return make(s);
            },
          },
          setPosition: (from: string, to: string) => record("chart.setPosition", from, to),
          seriesData: series,
        };
        charts.push(chart);
        return chart;
      },
    },
    notes: { add: (cell: string, text: string) => record("notes.add", cell, text) },
  };
  const charts: unknown[] = [];
  const names = {
    items: (options.existingNames ?? []).map((name) => ({ name })),
    load: (p: string) => record("names.load", p),
    add: (name: string, reference: string, comment: string) => record("names.add", name, reference, comment),
    getItem: (name: string) => {
      if (!names.items.some((n) => n.name === name)) throw new Error(`ItemNotFound: the name ${name} does not exist`);
      return { delete: () => record("names.delete", name) };
    },
    getItemOrNullObject: (name: string) => {
      record("names.getItemOrNullObject", name);
      const item = new OfficeMockObject({ isNullObject: !names.items.some((n) => n.name === name) });
      items.push(item);
      return Object.assign(item, { delete: () => record("names.delete", name) });
    },
  };
  const items: OfficeMockObject[] = [];
  const context = {
    workbook: {
      worksheets: {
        getItemOrNullObject: (name: string) => {
          record("worksheets.getItemOrNullObject", name);
          return sheet;
        },
        getItem: () => sheet,
        add: (name: string) => {
          record("worksheets.add", name);
          return sheet;
        },
      },
      names,
      comments: { add: (cell: string, text: string) => record("comments.add", cell, text) },
    },
    application: {
      suspendApiCalculationUntilNextSync: () => record("suspendApiCalculationUntilNextSync"),
      suspendScreenUpdatingUntilNextSync: () => record("suspendScreenUpdatingUntilNextSync"),
    },
    sync: async () => {
      await sheetState.sync();
      await used.sync();
      await oldChart.sync();
      for (const item of items) await item.sync();
      syncs++;
      record("sync");
    },
    charts,
  };
  return {
    Excel: { run: async (cb) => cb(context) },
    calls,
    syncs: () => syncs,
    ranges,
    requestSizes: () => {
      const sizes = new Array<number>(syncs).fill(0);
      for (const c of calls) if (SENDS.test(c.what) && c.afterSyncs < syncs) sizes[c.afterSyncs] += JSON.stringify(c.args).length;
      return sizes;
    },
  };
}

/** A plain object that records assignments to its properties. */
function recorder<T extends object>(label: string, target: T, record: (what: string, ...args: unknown[]) => void): T {
  return new Proxy(target, {
    set(t, prop, value) {
      record(`${label}.${String(prop)}`, value);
      (t as Record<string, unknown>)[String(prop)] = value;
      return true;
    },
  });
}

/**
 * Period labels of a label column (2021-01, 202101, 2021-Q1, 2021-01-31, ...): recognised so a
 * column of period numbers is not forecast as a series, and continued so the forecasts of
 * `ahead` carry the labels of the periods they are for.
 */

/** A label style: label text to a period count (months, quarters, days, ...) and back. */
interface LabelStyle {
  /** The period count of a label, or undefined when the label is not of this style. */
  read(label: string): number | undefined;
  /** The label of a period count, written as `like` was. */
  write(n: number, like: string): string;
}

const pad = (n: number, w: number) => String(n).padStart(w, "0");

/** 2021-01, 2021/01, 2021.01 (months since year 0). */
const YEAR_MONTH: LabelStyle = {
  read(s) {
    const m = /^(\d{4})([-/.])(\d{1,2})$/.exec(s);
    return m && Number(m[3]) >= 1 && Number(m[3]) <= 12 ? Number(m[1]) * 12 + Number(m[3]) - 1 : undefined;
  },
  write(n, like) {
    const sep = /^\d{4}([-/.])/.exec(like)![1];
    return `${Math.floor(n / 12)}${sep}${pad((n % 12) + 1, 2)}`;
  },
};

/** 202101 as a number (yyyymm). */
const YYYYMM: LabelStyle = {
  read(s) {
    const m = /^(\d{4})(\d{2})$/.exec(s);
    return m && Number(m[2]) >= 1 && Number(m[2]) <= 12 ? Number(m[1]) * 12 + Number(m[2]) - 1 : undefined;
  },
  write: (n) => `${Math.floor(n / 12)}${pad((n % 12) + 1, 2)}`,
};

/** 2021-Q1, 2021Q1, 2021 Q1, 2021-q1 (quarters since year 0). */
const YEAR_QUARTER: LabelStyle = {
  read(s) {
    const m = /^(\d{4})([- ]?)[Qq]([1-4])$/.exec(s);
    return m ? Number(m[1]) * 4 + Number(m[3]) - 1 : undefined;
  },
  write(n, like) {
    const m = /^\d{4}([- ]?)([Qq])/.exec(like)!;
    return `${Math.floor(n / 4)}${m[1]}${m[2]}${(n % 4) + 1}`;
  },
};

/** Q1 2021, Q1-2021. */
const QUARTER_YEAR: LabelStyle = {
  read(s) {
    const m = /^[Qq]([1-4])([- ]?)(\d{4})$/.exec(s);
    return m ? Number(m[3]) * 4 + Number(m[1]) - 1 : undefined;
  },
  write(n, like) {
    const m = /^([Qq])[1-4]([- ]?)/.exec(like)!;
    return `${m[1]}${(n % 4) + 1}${m[2]}${Math.floor(n / 4)}`;
  },
};

/** 20211 as a number (yyyyq, quarter 1-4). */
const YYYYQ: LabelStyle = {
  read(s) {
    const m = /^(\d{4})([1-4])$/.exec(s);
    return m ? Number(m[1]) * 4 + Number(m[2]) - 1 : undefined;
  },
  write: (n) => `${Math.floor(n / 4)}${(n % 4) + 1}`,
};

/** ISO dates 2021-01-31 (days since 1970). Steps of whole months are handled by MONTHLY_DATE. */
const ISO_DATE: LabelStyle = {
  read(s) {
    const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(s);
    if (!m) return undefined;
    const t = Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3]));
    const d = new Date(t);
    return d.getUTCDate() === Number(m[3]) && d.getUTCMonth() === Number(m[2]) - 1 ? t / 86400000 : undefined;
  },
  write: (n) => new Date(n * 86400000).toISOString().slice(0, 10),
};

/** ISO dates one or more months apart on the same day of the month, or on month ends. */
const MONTHLY_DATE: LabelStyle = {
  read(s) {
    if (ISO_DATE.read(s) === undefined) return undefined;
    const [y, m, d] = s.split("-").map(Number);
    const monthEnd = new Date(Date.UTC(y, m, 0)).getUTCDate() === d;
    // Month ends count as day 31 so that Jan 31, Feb 28, Mar 31 are one month apart.
    return (y * 12 + m - 1) * 32 + (monthEnd ? 31 : d);
  },
  write(n, like) {
    const day = n % 32;
    const months = Math.floor(n / 32);
    const y = Math.floor(months / 12);
    const m = (months % 12) + 1;
    const last = new Date(Date.UTC(y, m, 0)).getUTCDate();
    const likeDay = Number(like.slice(8, 10));
    return `${y}-${pad(m, 2)}-${pad(day === 31 || likeDay > last ? last : day, 2)}`;
  },
};

/** Years 1900-2199 and plain period numbers 1, 2, 3, ... */
const WHOLE: LabelStyle = {
  read: (s) => (/^\d{1,6}$/.test(s) ? Number(s) : undefined),
  write: (n) => String(n),
};

/** Most specific first: 202101 is a month before it is a whole number. */
const STYLES = [YEAR_MONTH, YEAR_QUARTER, QUARTER_YEAR, MONTHLY_DATE, ISO_DATE, YYYYMM, YYYYQ, WHOLE];

/**
 * The style and step under which the labels run evenly (every present label one step after
 * the previous), or undefined. MONTHLY_DATE steps are whole months (32 units each).
 */
function evenRun(labels: string[]): { style: LabelStyle; step: number } | undefined {
  const present = labels.filter((s) => s !== "");
  if (present.length < 2 || present.length !== labels.length) return undefined;
  for (const style of STYLES) {
    const n = present.map((s) => style.read(s));
    if (n.some((v) => v === undefined)) continue;
    const counts = n as number[];
    let step = counts[1] - counts[0];
    if (style === MONTHLY_DATE) {
      // Compare months only: 31 (a month end) against 28 in February.
      const months = counts.map((c) => Math.floor(c / 32));
      step = (months[1] - months[0]) * 32;
      if (step <= 0 || months.some((m, i) => i > 0 && (m - months[i - 1]) * 32 !== step) || counts.some((c) => c % 32 !== counts[0] % 32)) continue;
      return { style, step };
    }
    if (step <= 0 || counts.some((c, i) => i > 0 && c - counts[i - 1] !== step)) continue;
    return { style, step };
  }
  return undefined;
}

/** Labels of the `horizon` periods after `labels[last]`, or undefined when the labels do not run evenly up to there. */
export function nextLabels(labels: readonly string[], last: number, horizon: number): string[] | undefined {
  if (last < 1 || last >= labels.length) return undefined;
  const run = evenRun(labels.slice(Math.max(0, last - 2), last + 1));
  if (!run) return undefined;
  const end = labels[last];
  const n = run.style.read(end)!;
  return Array.from({ length: horizon }, (_, h) => run.style.write(n + run.step * (h + 1), end));
}

/** Header words that name a label column rather than a series. */
const LABEL_HEADERS = /^(date|day|week|month|quarter|year|period|time|t|label|yearmonth|year_month|yyyymm|period_id|periode|monat|mois|fecha|datum)s?$/i;

export function isLabelHeader(name: string): boolean {
  return LABEL_HEADERS.test(name.trim());
}

/**
 * Whole-number cells that count periods rather than sales: consecutive yyyymm months
 * (202101, 202102, ...), yyyyq quarters or years. Period numbers 1, 2, 3, ... are labels only
 * under a label header (a series of sales may count up too).
 */
export function looksLikePeriodNumbers(cells: readonly string[]): boolean {
  if (cells.length < 3) return false;
  const run = evenRun(cells as string[]);
  if (!run) return false;
  if (run.style === YYYYMM || run.style === YYYYQ) return run.step === 1;
  if (run.style !== WHOLE) return false;
  const first = Number(cells[0]);
  return run.step === 1 && first >= 1900 && first <= 2199;
}

/**
 * The CSV reader of the batch command, in process (no child process needed). Expected values
 * are read off the small CSV texts written in each test.
 */
import { CliError } from "../../src/cli/cliError";
import { parseSeriesText, type ReadOptions } from "../../src/cli/input/readSeries";
import type { SeriesTable } from "../../src/cli/input/seriesTable";

const f64 = (values: number[]) => Float64Array.from(values);

function columns(table: SeriesTable) {
  return Array.from({ length: table.seriesCount }, (_, k) => table.column(k));
}

function read(text: string, source = "the input", options: ReadOptions = {}) {
  const table = parseSeriesText(text, source, options);
  return { table, columns: columns(table) };
}

describe("parseSeriesText", () => {
  it("reads one series per column, blanks as missing, trailing blanks dropped per column", () => {
    const { table, columns: c } = read("North,South\n1,10\n,20\n3,\n4,\n,\n");
    expect(table.labels).toBeUndefined();
    expect(c.map((s) => [s.name, s.values])).toEqual([
      ["North", f64([1, NaN, 3, 4])],
      ["South", f64([10, 20])],
    ]);
  });

  it("skips a first column of labels such as months, and keeps it as labels", () => {
    const { table, columns: c } = read("month,Units\n2024-01,5\n2024-02,6.5\n2024-03,-7e1\n");
    expect(table.labels).toEqual({ name: "month", position: 0, values: ["2024-01", "2024-02", "2024-03"] });
    expect(c.map((s) => [s.name, s.values])).toEqual([["Units", f64([5, 6.5, -70])]]);
    expect(table.notes).toEqual([]);
  });

  it("keeps a numeric first column as a series, and a single column with blank lines as blanks", () => {
    expect(read("A,B\n1,2\n3,4\n").columns.map((c) => c.name)).toEqual(["A", "B"]);
    expect(read("Only\n1\n\n3\n\n").columns[0].values).toEqual(f64([1, NaN, 3]));
  });

  it("handles a byte-order mark, CRLF line ends, quoted names and short rows", () => {
    const { columns: c } = read('\uFEFF"Seed trays, small",B\r\n1,2\r\n3\r\n5,6\r\n');
    expect(c.map((s) => [s.name, s.values])).toEqual([
      ["Seed trays, small", f64([1, 3, 5])],
      ["B", f64([2, NaN, 6])],
    ]);
  });

  it("reports a cell that is not a number by its address, in that series only", () => {
    // Line 1 is the header, so the third data row is line 4; South is column C.
    const { columns: c } = read("month,North,South\n2020-01,1,2\n2020-02,3,4\n2020-03,5,1.2.3\n", "sales.csv");
    expect(c[0].problem).toBeUndefined();
    expect(c[0].values).toEqual(f64([1, 3, 5]));
    expect(c[1].problem).toMatch(/^Cell C4 of sales\.csv \(series "South", line 4, column 3\): "1\.2\.3" is not a number/);
  });

  it("counts a quoted cell spanning two lines when giving a line", () => {
    // Record 2 occupies lines 2-3, so the bad cell of the next record is on line 4.
    const { columns: c } = read('name,Units\n"two\nlines",1\nlabel,abc\nmore,3\n', "f.csv");
    expect(c[0].problem).toMatch(/Cell B4 of f\.csv/);
  });

  it("refuses words, hexadecimal and Infinity, which are not plain numbers", () => {
    for (const bad of ["ten", "0x10", "Infinity", "1,5"]) {
      expect(read(`A,B\n1,2\n2,"${bad}"\n3,4\n`).columns[1].problem).toMatch(/Cell B3/);
    }
  });

  it("refuses an empty file, a header of numbers, a names row alone and cells beyond the named columns", () => {
    expect(() => read("")).toThrow(/empty/);
    expect(() => read("1,2\n3,4\n")).toThrow(/must hold the series names/);
    expect(() => read("month,North\n")).toThrow(CliError);
    expect(() => read("month,North\n")).toThrow(/names row only, no periods/);
    expect(() => read("A\n1\n2,5\n")).toThrow(/Line 3 .* more cells than the first row has names/);
  });
});

describe("separator and decimal mark", () => {
  it("detects semicolons with decimal commas, and digit groups", () => {
    const { table, columns: c } = read("month;North;South\n2021-01;525,5;1.234,5\n2021-02;76;309,25\n");
    expect(table.dialect).toEqual({ delimiter: ";", decimal: "," });
    expect(c.map((s) => s.values)).toEqual([f64([525.5, 76]), f64([1234.5, 309.25])]);
  });

  it("detects tabs and pipes with decimal points", () => {
    expect(read("m\tA\tB\n1\t2.5\t3\n2\t4\t5.5\n").table.dialect).toEqual({ delimiter: "\t", decimal: "." });
    expect(read("A|B\n2.5|3\n4|5.5\n").columns[1].values).toEqual(f64([3, 5.5]));
  });

  it("takes --delimiter and --decimal as given", () => {
    const { columns: c } = read("A;B\n1,5;2\n", "x", { delimiter: ";", decimal: "," });
    expect(c[0].values).toEqual(f64([1.5]));
  });

  it("says which option to give when the sample does not tell", () => {
    expect(() => read("A;B,C\n1;2\n3,4;5,6;7\n", "odd.csv")).toThrow(/Cannot tell the column separator of odd\.csv.*--delimiter/);
    expect(() => read("A;B\n1,5;2.5\n", "mixed.csv")).toThrow(/Cannot tell the decimal mark of mixed\.csv.*--decimal , or --decimal \./);
  });

  it("points at --delimiter when cells hold another separator", () => {
    const { columns: c } = read("month;North;South\n2021-01;525;76\n2021-02;500;80\n", "eu.csv", { delimiter: "," });
    expect(c[0].problem).toMatch(/"2021-01;525;76" is not a number.*give --delimiter ;/);
  });
});

describe("label column", () => {
  it("takes a first column of yyyymm period numbers as labels, with a note", () => {
    const { table, columns: c } = read("period,North\n202111,5\n202112,6\n202201,7\n");
    expect(table.labels?.values).toEqual(["202111", "202112", "202201"]);
    expect(c.map((s) => s.name)).toEqual(["North"]);
    expect(table.notes[0]).toMatch(/first column "period" holds period labels .*--labels none/);
  });

  it("takes a column named by --labels, wherever it is, and none means every column is a series", () => {
    const text = "North,when,South\n1,a,2\n3,b,4\n";
    const named = read(text, "x", { labels: "when" });
    expect(named.table.labels?.values).toEqual(["a", "b"]);
    expect(named.columns.map((s) => s.name)).toEqual(["North", "South"]);
    expect(read("period,North\n202111,5\n202112,6\n202201,7\n", "x", { labels: "none" }).columns.map((s) => s.name)).toEqual(["period", "North"]);
    expect(() => read(text, "x", { labels: "date" })).toThrow(/--labels: x has no column named "date". Its columns are: "North", "when", "South"/);
  });

  it("keeps a first column of sales that merely counts up as a series, unless its header names periods", () => {
    expect(read("A,B\n1,1\n2,2\n3,3\n").table.labels).toBeUndefined();
    expect(read("t,B\n1,1\n2,2\n3,3\n").table.labels?.name).toBe("t");
  });

  it("warns about names used by more than one series column", () => {
    const { table } = read("month,North,South,North\n2021-01,1,2,3\n");
    expect(table.notes).toEqual([expect.stringMatching(/columns B, D are all named "North"/)]);
  });
});

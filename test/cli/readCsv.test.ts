/**
 * The CSV reader of the batch command, in process (no child process needed). Expected values
 * are read off the small CSV texts written in each test.
 */
import { CliError } from "../../src/cli/cliError";
import { parseSeriesCsv } from "../../src/cli/readCsv";

describe("parseSeriesCsv", () => {
  it("reads one series per column, blanks as null, trailing blanks dropped per column", () => {
    const { columns, labels } = parseSeriesCsv("North,South\n1,10\n,20\n3,\n4,\n,\n");
    expect(labels).toBeUndefined();
    expect(columns).toEqual([
      { name: "North", values: [1, null, 3, 4] },
      { name: "South", values: [10, 20] },
    ]);
  });

  it("skips a first column of labels such as months, and keeps it as labels", () => {
    const { columns, labels } = parseSeriesCsv("month,Units\n2024-01,5\n2024-02,6.5\n2024-03,-7e1\n");
    expect(labels).toEqual({ name: "month", values: ["2024-01", "2024-02", "2024-03"] });
    expect(columns).toEqual([{ name: "Units", values: [5, 6.5, -70] }]);
  });

  it("keeps a numeric first column as a series, and a single column with blank lines as blanks", () => {
    expect(parseSeriesCsv("A,B\n1,2\n3,4\n").columns.map((c) => c.name)).toEqual(["A", "B"]);
    expect(parseSeriesCsv("Only\n1\n\n3\n\n").columns).toEqual([{ name: "Only", values: [1, null, 3] }]);
  });

  it("handles a byte-order mark, CRLF line ends, quoted names and short rows", () => {
    const { columns } = parseSeriesCsv('\uFEFF"Seed trays, small",B\r\n1,2\r\n3\r\n5,6\r\n');
    expect(columns).toEqual([
      { name: "Seed trays, small", values: [1, 3, 5] },
      { name: "B", values: [2, null, 6] },
    ]);
  });

  it("names the series and the file line of a cell that is not a number", () => {
    // Line 1 is the header, so the third data row is line 4.
    const text = "month,North,South\n2020-01,1,2\n2020-02,3,4\n2020-03,5,1.2.3\n";
    expect(() => parseSeriesCsv(text, "sales.csv")).toThrow(CliError);
    expect(() => parseSeriesCsv(text, "sales.csv")).toThrow(/Series "South", row 4 of sales\.csv: "1\.2\.3" is not a number/);
  });

  it("counts a quoted cell spanning two lines when giving a row", () => {
    // Record 2 occupies lines 2-3, so the bad cell of the next record is on line 4.
    const text = 'name,Units\n"two\nlines",1\nlabel,abc\nmore,3\n';
    expect(() => parseSeriesCsv(text, "f.csv")).toThrow(/row 4 of f\.csv/);
  });

  it("rejects words, hexadecimal and Infinity, which are not plain numbers", () => {
    for (const bad of ["ten", "0x10", "Infinity", "1,5"]) {
      expect(() => parseSeriesCsv(`A,B\n1,2\n2,"${bad}"\n3,4\n`)).toThrow(/Series "B", row 3/);
    }
  });

  it("refuses an empty file, a header of numbers, and cells beyond the named columns", () => {
    expect(() => parseSeriesCsv("")).toThrow(/empty/);
    expect(() => parseSeriesCsv("1,2\n3,4\n")).toThrow(/must hold the series names/);
    expect(() => parseSeriesCsv("A\n1\n2,5\n")).toThrow(/Line 3 .* more cells than the first row has names/);
  });
});

import { createEbbWorkbook } from "../../../src/functions/hyperformula";
import { PreviewWorkbook } from "../../../src/preview/workbook/previewWorkbook";
import { readDemo } from "../../functions/support/demo";

/**
 * A small preview workbook on one sheet "S": the first `months` of the invented demo's seed
 * trays in column A and =EBB.AHEAD(A1:A<months>, 12, 6) at C1, spilling over C1:C6.
 */
export function aheadBook(months: number): PreviewWorkbook {
  const seed = readDemo().columns[0].slice(0, months);
  const grid: (number | string | null)[][] = seed.map((v) => [v, null, null, null, null]);
  grid[0][2] = `=EBB.AHEAD(A1:A${months}, 12, 6)`; // C1:C6
  return new PreviewWorkbook(createEbbWorkbook({ S: grid as never }, {}));
}

/** The flags' shading rules as formulas (relative to the flagged range's top-left cell), one wording for every writer. */

/** True where the cell holds the phrase, ignoring case (SEARCH), as the hosts' text rules compare. */
export function textFlagFormula(phrase: string, cell: string): string {
  return `NOT(ISERROR(SEARCH("${phrase.replace(/"/g, '""')}",${cell})))`;
}

/** True where the cell holds a number outside [low, high]; text (a blank signal) is never shaded. */
export function numberFlagFormula(low: number, high: number, cell: string): string {
  return `AND(ISNUMBER(${cell}),OR(${cell}<${low},${cell}>${high}))`;
}


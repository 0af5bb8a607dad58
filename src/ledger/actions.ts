/**
 * The names of the Ebb ledger panel's actions, in one place: the panel's buttons, the ledger's
 * notes, the preview's Read me sheet, the check's messages and the batch command's messages
 * all use these words, and the README quotes them.
 */
export const ACTIONS = {
  write: "Write ledger",
  extend: "Add new actuals",
  verify: "Check against the engine",
  fit: "Fit constants into its settings",
  refreshInterval: "Update the simulated interval",
} as const;

/**
 * A stand-in for the spreadsheet host's CustomFunctions global, as the runtime documents it
 * (CustomFunctions.Error with a code and a message; ErrorCode "#VALUE!", "#N/A", ...).
 */
export class FakeHostError {
  constructor(
    readonly code: string,
    readonly message?: string,
  ) {}
}

export function installFakeCustomFunctions(): void {
  (globalThis as Record<string, unknown>).CustomFunctions = {
    Error: FakeHostError,
    ErrorCode: { invalidValue: "#VALUE!", notAvailable: "#N/A", divisionByZero: "#DIV/0!", invalidNumber: "#NUM!", nullReference: "#NULL!" },
    associate: () => undefined,
  };
}

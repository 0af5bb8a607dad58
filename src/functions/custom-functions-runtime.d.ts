/**
 * The part of the spreadsheet host's custom-functions runtime that Ebb uses. The runtime
 * provides the global `CustomFunctions` object in the add-in's page.
 */
declare namespace CustomFunctions {
  enum ErrorCode {
    invalidValue = "#VALUE!",
    notAvailable = "#N/A",
    divisionByZero = "#DIV/0!",
    invalidNumber = "#NUM!",
    nullReference = "#NULL!",
  }
  class Error {
    constructor(code: ErrorCode, message?: string);
    code: ErrorCode;
    message?: string;
  }
  function associate(id: string, functionObject: (...args: any[]) => unknown): void;
}

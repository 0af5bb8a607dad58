/**
 * Prints one plain closing line, "jest: N passed, N failed, N skipped", so a CI log states
 * plainly how many tests ran.
 */
class SummaryReporter {
  onRunComplete(_contexts, results) {
    const { numPassedTests, numFailedTests, numPendingTests, numTodoTests } = results;
    process.stdout.write(`\njest: ${numPassedTests} passed, ${numFailedTests} failed, ${numPendingTests + numTodoTests} skipped\n`);
  }
}
module.exports = SummaryReporter;

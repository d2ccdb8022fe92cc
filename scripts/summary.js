// Prints the plain closing line CI reads ("N passed, N failed") from jest's --json output.
const fs = require('fs');
const file = process.argv[2];
let report;
try {
  report = JSON.parse(fs.readFileSync(file, 'utf8'));
} catch (err) {
  console.log('0 passed, 1 failed');
  console.error(`could not read the jest report ${file}: ${err.message}`);
  process.exit(0);
}
const failed = report.numFailedTests + report.numRuntimeErrorTestSuites;
const skipped = report.numPendingTests + report.numTodoTests;
console.log(`${report.numPassedTests} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);

// Runs the unit/component suite and then the real-browser suite, and ends with one line
// `N passed, N failed` summed over both. Exits non-zero if any test failed, a run failed,
// or a results file is missing.
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, rmSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const vitestBin = path.join(repoRoot, 'node_modules', '.bin', 'vitest');

const suites = [
  { name: 'unit', resultsFile: '.vitest-results.json', configArgs: [] },
  { name: 'e2e', resultsFile: '.vitest-e2e-results.json', configArgs: ['--config', 'vitest.e2e.config.mts'] },
];

let passed = 0;
let failed = 0;
let skipped = 0;
let ok = true;

for (const suite of suites) {
  const resultsPath = path.join(repoRoot, suite.resultsFile);
  rmSync(resultsPath, { force: true });

  console.log(`\n=== ${suite.name} tests ===`);
  const run = spawnSync(
    vitestBin,
    [
      'run',
      ...suite.configArgs,
      '--reporter=default',
      '--reporter=json',
      `--outputFile=${suite.resultsFile}`,
    ],
    { cwd: repoRoot, stdio: 'inherit', env: process.env },
  );
  if (run.error) {
    console.error(`${suite.name}: could not start vitest: ${run.error.message}`);
    ok = false;
  } else if (run.status !== 0) {
    console.error(`${suite.name}: vitest exited with ${run.status ?? run.signal}`);
    ok = false;
  }

  if (!existsSync(resultsPath)) {
    console.error(
      `${suite.name}: results file ${suite.resultsFile} is missing; counting the suite as 1 failed`,
    );
    failed += 1;
    ok = false;
    continue;
  }
  const results = JSON.parse(readFileSync(resultsPath, 'utf8'));
  const runFailed = run.status !== 0 || !results.success;
  let suiteFailed = results.numFailedTests;
  let suiteSkipped = results.numPendingTests + results.numTodoTests;
  if (runFailed && suiteFailed === 0) {
    // A setup, hook or import error fails the run without failing a test: count what did not pass.
    suiteFailed = Math.max(1, results.numTotalTests - results.numPassedTests);
    suiteSkipped = 0;
    console.error(`${suite.name}: the run failed outside any test; counting ${suiteFailed} as failed`);
  }
  passed += results.numPassedTests;
  failed += suiteFailed;
  skipped += suiteSkipped;
  if (runFailed) ok = false;
  if (results.numTotalTests === 0) {
    console.error(`${suite.name}: no tests ran`);
    ok = false;
  }
}

if (failed > 0) ok = false;
if (skipped > 0) console.log(`note: ${skipped} tests were skipped or marked todo`);
console.log(`${passed} passed, ${failed} failed`);
process.exit(ok ? 0 : 1);

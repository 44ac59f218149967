#!/usr/bin/env node
// The project's one test command: format+lint, type-check, the layout check, then every vitest suite.
// Ends with a plain `N passed, N failed, N skipped` line, read by CI, and fails when no test ran.
import { spawnSync } from 'node:child_process';
import { mkdirSync, readFileSync, rmSync } from 'node:fs';

function run(label, cmd, args) {
  process.stderr.write(`\n== ${label}: ${cmd} ${args.join(' ')}\n`);
  const r = spawnSync(cmd, args, { stdio: 'inherit' });
  return r.status ?? 1;
}

let failedSteps = 0;
failedSteps += run('format and lint', 'npx', ['biome', 'check', '.']) === 0 ? 0 : 1;
failedSteps += run('type-check', 'npx', ['tsc', '--noEmit', '-p', 'tsconfig.json']) === 0 ? 0 : 1;
failedSteps += run('layout (cycles, layers, file size)', 'node', ['scripts/checkLayout.mjs']) === 0 ? 0 : 1;

mkdirSync('test-results', { recursive: true });
const jsonPath = 'test-results/vitest.json';
rmSync(jsonPath, { force: true });
const extra = process.argv.slice(2);
const vitestStatus = run('tests', 'npx', [
  'vitest',
  'run',
  '--reporter=default',
  '--reporter=json',
  `--outputFile.json=${jsonPath}`,
  ...extra,
]);

let passed = 0;
let failed = 0;
let skipped = 0;
try {
  const report = JSON.parse(readFileSync(jsonPath, 'utf8'));
  passed = report.numPassedTests ?? 0;
  failed = report.numFailedTests ?? 0;
  skipped = (report.numPendingTests ?? 0) + (report.numTodoTests ?? 0);
  // A suite that fails to load has no tests counted: count it as a failure.
  failed += (report.testResults ?? []).filter(
    (s) => s.status === 'failed' && s.assertionResults.length === 0,
  ).length;
} catch {
  failed += 1;
}
if (failedSteps > 0)
  process.stderr.write(`\n${failedSteps} check step(s) failed (lint/format, type-check or layout)\n`);
failed += failedSteps;
console.log(`${passed} passed, ${failed} failed, ${skipped} skipped`);
if (passed === 0) {
  process.stderr.write('no test ran\n');
  process.exit(1);
}
process.exit(failed > 0 || vitestStatus !== 0 ? 1 : 0);

#!/usr/bin/env node
// Merge the adversarial suite's saved counts (test-results/adversarial/*.json from the command-line
// families, test-results/adversarial-page.json from the page's; one row per family) into README.md
// between the adversarial-table markers. Rows are sorted by family, so suites merge without conflict.
import { existsSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';

const dir = 'test-results/adversarial';
const cliRows = existsSync(dir)
  ? readdirSync(dir)
      .filter((f) => f.endsWith('.json'))
      .map((f) => JSON.parse(readFileSync(`${dir}/${f}`, 'utf8')))
  : [];
// The page's suite keeps its rows in one file (test/adversarial/pageHarness.ts, FamilyRow).
const pageFile = 'test-results/adversarial-page.json';
const pageRows = existsSync(pageFile)
  ? JSON.parse(readFileSync(pageFile, 'utf8')).map((r) => ({
      family: /^page\b/i.test(r.family) ? r.family.replace(/^page/i, 'Page') : `Page: ${r.family}`,
      test: 'test/adversarial/page-*.test.ts',
      tried: r.inputs,
      crashes: r.crashes,
      hangs: r.hangs,
      lostRows: r.lost_work,
      injections: r.executed_injections,
    }))
  : [];
const rows = [...cliRows, ...pageRows].sort((a, b) =>
  a.family < b.family ? -1 : a.family > b.family ? 1 : 0,
);
const fmt = (n) => String(n).replace(/\B(?=(\d{3})+(?!\d))/g, ' ');
const total = (k) => rows.reduce((s, r) => s + r[k], 0);
const lines = [
  '| family | inputs tried | crashes | hangs | lost rows or work | executed injections | test |',
  '|---|---|---|---|---|---|---|',
  ...rows.map(
    (r) =>
      `| ${r.family} | ${fmt(r.tried)} | ${r.crashes} | ${r.hangs} | ${r.lostRows} | ${r.injections} | \`${r.test}\` |`,
  ),
  `| **all** | **${fmt(total('tried'))}** | **${total('crashes')}** | **${total('hangs')}** | **${total('lostRows')}** | **${total('injections')}** | |`,
];
const start = '<!-- adversarial-table:start -->';
const end = '<!-- adversarial-table:end -->';
const readme = readFileSync('README.md', 'utf8');
const a = readme.indexOf(start);
const b = readme.indexOf(end);
if (a < 0 || b < a) {
  console.error(`README.md has no ${start} ... ${end} markers`);
  process.exit(1);
}
writeFileSync('README.md', `${readme.slice(0, a + start.length)}\n${lines.join('\n')}\n${readme.slice(b)}`);
console.log(lines.join('\n'));

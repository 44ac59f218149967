/**
 * CSV formula safety (issue 14, item 11; OWASP "CSV Injection"): a text cell that a spreadsheet would
 * run as a formula (starting with =, +, -, @, a tab or a carriage return) is written with a leading
 * apostrophe, quoted; numbers, negative ones included, stay numbers. Seeded random texts and numbers,
 * then an end-to-end sweep whose plan varies hostile names. "Executed injections" counts cells of the
 * written CSV that a spreadsheet would still read as a formula.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { chunkText, writeSweep } from '../../src/cli/main';
import { expandPlan } from '../../src/compute/planFile';
import { csvField, parseCsvLine } from '../../src/compute/resultTable';
import { mulberry32 } from '../../src/model/random';
import { family } from './tally';

const csv = family('CLI: CSV formula safety', 'test/adversarial/csvFormula.test.ts');
afterAll(() => csv.save());

const TRIGGER = /^[=+\-@\t\r]/;
const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** Would a spreadsheet run this cell (as read back from the CSV) as a formula? */
function runsAsFormula(cell: string): boolean {
  return TRIGGER.test(cell) && !NUMBER.test(cell);
}

describe('CSV formula safety', () => {
  it('random hostile texts are neutralised; random numbers stay numeric and round-trip', () => {
    const random = mulberry32(1411);
    const alphabet = [
      '=',
      '+',
      '-',
      '@',
      '\t',
      '\r',
      '"',
      ',',
      '\n',
      'a',
      'Z',
      '1',
      '(',
      ')',
      '|',
      '!',
      ' ',
      "'",
      'é',
    ];
    for (let k = 0; k < 2000; k++) {
      let text = '';
      const n = 1 + Math.floor(random() * 12);
      for (let i = 0; i < n; i++) text += alphabet[Math.floor(random() * alphabet.length)];
      const field = csvField(text);
      const back = parseCsvLine(`${field}\n`);
      csv.tried++;
      expect(back.length, JSON.stringify(text)).toBe(1);
      const cell = back[0]!;
      if (runsAsFormula(cell)) csv.injections++;
      expect(runsAsFormula(cell), `${JSON.stringify(text)} -> ${field}`).toBe(false);
      // Nothing is lost: the neutralised cell is the text behind one apostrophe.
      expect(cell === text || cell === `'${text}`, JSON.stringify(text)).toBe(true);
    }
    for (let k = 0; k < 2000; k++) {
      const x = (random() - 0.5) * 10 ** Math.floor(random() * 40 - 20);
      const field = csvField(k % 2 === 0 ? x : String(x));
      csv.tried++;
      expect(field, `number ${x}`).toBe(String(x));
      expect(Number(field)).toBe(x);
    }
    expect(csvField(-1.5e-3)).toBe('-0.0015');
    expect(csvField('-1.5e-3')).toBe('-1.5e-3');
    expect(csvField('=HYPERLINK("http://x","y")')).toBe(`"'=HYPERLINK(""http://x"",""y"")"`);
  });

  it('a sweep whose plan varies hostile names writes no cell a spreadsheet would run', async () => {
    const names = ['=1+1', "+cmd|' /C calc'!A0", '-2+3', '@SUM(A1:A2)', '\tTAB', '\rCR', 'plain', '-1.5e-3'];
    const plan = expandPlan({
      name: names,
      conditions: { airspeed_mps: 10, yaw_deg: [-5, 5] },
      model: { lattice_span: 8, lattice_chord: 4, grid_convergence: false },
    });
    if (!plan.ok) throw new Error(plan.errors.join('\n'));
    let out = '';
    await writeSweep(plan.value, 'csv', (t) => {
      out += chunkText(t);
    });
    // Rows split on line ends outside quotes.
    const records: string[] = [];
    let current = '';
    let quoted = false;
    for (const ch of out) {
      if (ch === '"') quoted = !quoted;
      if (ch === '\n' && !quoted) {
        records.push(current);
        current = '';
      } else current += ch;
    }
    let negatives = 0;
    for (const record of records.slice(1)) {
      const cells = parseCsvLine(record);
      for (const cell of cells) {
        csv.tried++;
        if (runsAsFormula(cell)) csv.injections++;
        expect(runsAsFormula(cell), `cell ${JSON.stringify(cell)}`).toBe(false);
        if (/^-\d/.test(cell)) negatives++;
      }
    }
    expect(records.length).toBe(1 + names.length * 2);
    expect(negatives, 'negative numbers are written as numbers').toBeGreaterThan(0);
  });
});

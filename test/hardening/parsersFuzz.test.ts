/**
 * Fuzzing every parser of the tool's input boundaries with fast-check (issue 7): random and malformed
 * bytes, JSON and CSV, and mutations of the real example files. What must hold for each input:
 *   - the parser returns a result object { ok: true, value } or { ok: false, errors } and never throws;
 *   - a failure has at least one message, each a non-empty line of bounded length (clear, printable);
 *   - it answers in bounded time (each call is checked against a generous bound: a hang detector, not
 *     a benchmark; fast-check also stops generating after its time budget).
 * The parsers are the browser-safe ones the page and the command line share.
 */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseCaseFile, parseJsonText, validateCase } from '../../src/compute/caseFile';
import { convertTable } from '../../src/compute/compare/convertData';
import { CsvReader, parseCsvText, readCsvStream } from '../../src/compute/compare/csv';
import { guessMap } from '../../src/compute/compare/guessMap';
import { parseMapFile, validateMap } from '../../src/compute/compare/mapFile';
import { expandPlan, parsePlanFile } from '../../src/compute/planFile';
import { parseRideFile, validateRide } from '../../src/compute/ride/rideFile';
import { checkProperty } from './arbitraries';

const SEED = 7_2024;
/**
 * A call taking longer than this is treated as a hang (ms). Typical calls take well under 10 ms; the bound
 * is generous because the multi-megabyte inputs took about 2 s on a loaded 2-core machine.
 */
const HANG_MS = 10_000;
const BUDGET_MS = 2500;
/** Longest message we accept as "clear" (characters). */
const MAX_MESSAGE = 600;

const examples = resolve(__dirname, '../../public/examples');
const demo = resolve(__dirname, '../../public/demo');
const CASE = JSON.parse(readFileSync(resolve(examples, 'demo-case.json'), 'utf8')) as unknown;
const PLAN = JSON.parse(readFileSync(resolve(examples, 'demo-plan.json'), 'utf8')) as unknown;
const RIDE = JSON.parse(readFileSync(resolve(examples, 'ride.json'), 'utf8')) as unknown;
const MAP = JSON.parse(readFileSync(resolve(demo, 'demo-map.json'), 'utf8')) as unknown;
const CSV = readFileSync(resolve(demo, 'demo-tunnel.csv'), 'utf8');

type Result = { ok: true; value: unknown } | { ok: false; errors: string[] };

/** Counts of inputs fed to each parser (printed for the README figures). */
const fed: Record<string, number> = {};

/** Call a parser, asserting the contract above; returns the result. */
function contract<R extends Result>(name: string, input: unknown, run: () => R): R {
  fed[name] = (fed[name] ?? 0) + 1;
  const t0 = performance.now();
  let result: R;
  try {
    result = run();
  } catch (error) {
    throw new Error(`${name} threw on ${show(input)}: ${String(error)}`);
  }
  const ms = performance.now() - t0;
  expect(ms, `${name} took ${ms.toFixed(0)} ms on ${show(input)} (bound ${HANG_MS} ms)`).toBeLessThan(
    HANG_MS,
  );
  expect(typeof result.ok, `${name} on ${show(input)}`).toBe('boolean');
  if (!result.ok) {
    expect(result.errors.length, `${name}: no message for ${show(input)}`).toBeGreaterThan(0);
    for (const e of result.errors) {
      expect(typeof e, name).toBe('string');
      expect(e.trim().length, `${name}: empty message for ${show(input)}`).toBeGreaterThan(0);
      expect(
        e.length,
        `${name}: message of ${e.length} characters: ${e.slice(0, 200)}...`,
      ).toBeLessThanOrEqual(MAX_MESSAGE);
    }
  }
  return result;
}

function show(input: unknown): string {
  const text = typeof input === 'string' ? JSON.stringify(input) : safeJson(input);
  return text.length > 300 ? `${text.slice(0, 300)}... (${text.length} chars)` : text;
}

function safeJson(v: unknown): string {
  try {
    return JSON.stringify(v) ?? String(v);
  } catch {
    return String(v);
  }
}

// ---------------------------------------------------------------------------------------------
// Generators

/** Arbitrary text: unicode, raw bytes decoded as latin-1, and JSON-looking fragments. */
const anyText = fc.oneof(
  fc.string({ unit: 'binary', maxLength: 300 }),
  fc.uint8Array({ maxLength: 300 }).map((b) => String.fromCharCode(...b)),
  fc.json({ maxDepth: 4 }),
  fc.json({ maxDepth: 4 }).map((j) => j.slice(0, Math.max(0, j.length - 1))),
  fc
    .array(
      fc.constantFrom(
        '{',
        '}',
        '[',
        ']',
        '"',
        ':',
        ',',
        '1',
        'e',
        '-',
        'null',
        'true',
        ' ',
        '\n',
        '\\',
        '\u0000',
      ),
      {
        maxLength: 80,
      },
    )
    .map((a) => a.join('')),
);

/** A JSON value that replaces a leaf: wrong types, edges, non-finite-looking strings, deep nesting. */
const leaf: fc.Arbitrary<unknown> = fc.oneof(
  fc.constantFrom(
    null,
    true,
    false,
    0,
    -0,
    -1,
    1e308,
    -1e308,
    5e-324,
    'NaN',
    'Infinity',
    '',
    '1e999',
    [],
    {},
  ),
  fc.double(),
  fc.integer(),
  fc.string({ maxLength: 20 }),
  fc.array(fc.double({ noNaN: true }), { maxLength: 5 }),
  fc.record({ from: fc.double(), to: fc.double(), step: fc.double() }),
  fc.jsonValue({ maxDepth: 3 }),
);

function paths(value: unknown, prefix: string[] = []): string[][] {
  if (value === null || typeof value !== 'object') return [prefix];
  const out: string[][] = [prefix];
  for (const [k, v] of Object.entries(value as Record<string, unknown>))
    out.push(...paths(v, [...prefix, k]));
  return out;
}

/** Mutations of a real file: replace or delete a node at a random key path, or add an unknown key. */
function mutated(base: unknown): fc.Arbitrary<unknown> {
  const all = paths(base).filter((p) => p.length > 0);
  const mutation = fc.record({
    path: fc.constantFrom(...all),
    kind: fc.constantFrom('replace', 'delete', 'add'),
    value: leaf,
    key: fc.string({ minLength: 1, maxLength: 12 }),
  });
  return fc.array(mutation, { minLength: 1, maxLength: 4 }).map((ms) => {
    const copy = structuredClone(base) as Record<string, unknown>;
    for (const m of ms) {
      let node: unknown = copy;
      for (const k of m.path.slice(0, -1)) {
        if (node === null || typeof node !== 'object') break;
        node = (node as Record<string, unknown>)[k];
      }
      if (node === null || typeof node !== 'object') continue;
      const last = m.path[m.path.length - 1]!;
      const obj = node as Record<string, unknown>;
      if (m.kind === 'replace') obj[last] = m.value;
      else if (m.kind === 'delete') delete obj[last];
      else obj[m.key] = m.value;
    }
    return copy;
  });
}

/** CSV-looking text: random cells with quotes, delimiters, comments, decimal commas and line ends. */
const csvText = fc
  .record({
    delimiter: fc.constantFrom(',', ';', '\t'),
    header: fc.array(
      fc.oneof(fc.constantFrom('yaw_deg', 'Fx [N]', 'speed (km/h)', 'Cd', ''), fc.string({ maxLength: 8 })),
      {
        minLength: 0,
        maxLength: 6,
      },
    ),
    rows: fc.array(
      fc.array(
        fc.oneof(
          fc.double().map(String),
          fc.constantFrom('', '"', '""', '"a,b"', '1,5', '#', 'NaN', '-', '1e999', '"\n"', ' 3 '),
          fc.string({ maxLength: 6 }),
        ),
        { maxLength: 7 },
      ),
      { maxLength: 30 },
    ),
    eol: fc.constantFrom('\n', '\r\n', '\r'),
    bom: fc.boolean(),
  })
  .map(
    ({ delimiter, header, rows, eol, bom }) =>
      (bom ? '\ufeff' : '') + [header, ...rows].map((r) => r.join(delimiter)).join(eol),
  );

// ---------------------------------------------------------------------------------------------

describe('parsers never throw, never hang, and explain every failure (fast-check)', () => {
  it('case files: random text, random JSON and mutated examples', () => {
    checkProperty(
      fc.property(
        fc.oneof(
          anyText,
          mutated(CASE).map((v) => JSON.stringify(v)),
        ),
        (text) => {
          contract('parseCaseFile', text, () => parseCaseFile(text));
        },
      ),
      { seed: SEED, numRuns: 300, timeLimitMs: BUDGET_MS },
    );
    checkProperty(
      fc.property(fc.oneof(mutated(CASE), fc.jsonValue({ maxDepth: 4 }), leaf), (value) => {
        contract('validateCase', value, () => validateCase(value));
      }),
      { seed: SEED + 1, numRuns: 300, timeLimitMs: BUDGET_MS },
    );
  });

  it('plan files: random text and mutated examples (ranges, lists, nesting)', () => {
    checkProperty(
      fc.property(
        fc.oneof(
          anyText,
          mutated(PLAN).map((v) => JSON.stringify(v)),
        ),
        (text) => {
          contract('parsePlanFile', text, () => parsePlanFile(text));
        },
      ),
      { seed: SEED + 2, numRuns: 200, timeLimitMs: BUDGET_MS },
    );
    checkProperty(
      fc.property(fc.oneof(mutated(PLAN), fc.jsonValue({ maxDepth: 4 })), (value) => {
        contract('expandPlan', value, () => expandPlan(value));
      }),
      { seed: SEED + 3, numRuns: 200, timeLimitMs: BUDGET_MS },
    );
  });

  it('ride files and map files: random text and mutated examples', () => {
    checkProperty(
      fc.property(
        fc.oneof(
          anyText,
          mutated(RIDE).map((v) => JSON.stringify(v)),
        ),
        (text) => {
          contract('parseRideFile', text, () => parseRideFile(text));
        },
      ),
      { seed: SEED + 4, numRuns: 200, timeLimitMs: BUDGET_MS },
    );
    checkProperty(
      fc.property(fc.oneof(mutated(RIDE), fc.jsonValue({ maxDepth: 4 })), (value) => {
        contract('validateRide', value, () => validateRide(value));
      }),
      { seed: SEED + 5, numRuns: 200, timeLimitMs: BUDGET_MS },
    );
    checkProperty(
      fc.property(
        fc.oneof(
          anyText,
          mutated(MAP).map((v) => JSON.stringify(v)),
        ),
        (text) => {
          contract('parseMapFile', text, () => parseMapFile(text));
        },
      ),
      { seed: SEED + 6, numRuns: 300, timeLimitMs: BUDGET_MS },
    );
    checkProperty(
      fc.property(fc.oneof(mutated(MAP), fc.jsonValue({ maxDepth: 4 })), (value) => {
        contract('validateMap', value, () => validateMap(value));
      }),
      { seed: SEED + 7, numRuns: 200, timeLimitMs: BUDGET_MS },
    );
  });

  it('CSV: random text and CSV-like tables, whole and in random chunks; converted with the demo map', () => {
    const map = validateMap(MAP);
    if (!map.ok) throw new Error(map.errors.join('; '));
    checkProperty(
      fc.property(
        fc.oneof(
          anyText,
          csvText,
          // The demo tunnel data with a random cut, insertion or deletion.
          fc
            .record({ at: fc.nat(CSV.length), cut: fc.nat(40), insert: fc.string({ maxLength: 8 }) })
            .map(({ at, cut, insert }) => CSV.slice(0, at) + insert + CSV.slice(at + cut)),
        ),
        fc.array(fc.integer({ min: 1, max: 40 }), { minLength: 1, maxLength: 8 }),
        (text, cuts) => {
          const whole = contract('parseCsvText', text, () => parseCsvText(text));
          // The incremental reader gives the same answer however the text is cut.
          const chunked = contract('CsvReader (chunks)', text, () => {
            const reader = new CsvReader();
            let at = 0;
            for (let k = 0; at < text.length; k++) {
              const n = cuts[k % cuts.length]!;
              reader.push(
                text.charCodeAt(0) === 0xfeff && at === 0 ? text.slice(1, n) : text.slice(at, at + n),
              );
              at += n;
            }
            return reader.end();
          });
          expect(chunked, show(text)).toEqual(whole);
          if (whole.ok) {
            contract('convertTable', text, () => convertTable(whole.value, map.value, 1.2));
            const guess = guessMap(whole.value.headers, whole.value, { referenceAreaM2: 0.35 });
            expect(typeof guess).toBe('object');
          }
        },
      ),
      { seed: SEED + 8, numRuns: 400, timeLimitMs: BUDGET_MS },
    );
  });

  it('CSV streams of random bytes (invalid UTF-8 included) in random chunks', async () => {
    await checkProperty(
      fc.asyncProperty(fc.array(fc.uint8Array({ maxLength: 64 }), { maxLength: 10 }), async (chunks) => {
        const stream = new ReadableStream<Uint8Array>({
          start(controller) {
            for (const c of chunks) controller.enqueue(c);
            controller.close();
          },
        });
        fed['readCsvStream'] = (fed['readCsvStream'] ?? 0) + 1;
        const result = await readCsvStream(stream);
        expect(typeof result.ok).toBe('boolean');
        if (!result.ok) expect(result.errors.length).toBeGreaterThan(0);
      }),
      { seed: SEED + 9, numRuns: 200, timeLimitMs: BUDGET_MS },
    );
  });

  it('pathological inputs: deep nesting, huge lists and ranges, long lines, many comments', () => {
    const deep = (n: number, open: string, close: string) => open.repeat(n) + close.repeat(n);
    const nested = (n: number) => {
      let v: unknown = 1;
      for (let i = 0; i < n; i++) v = { a: v };
      return v;
    };
    const texts: Array<[string, string]> = [
      ['deep list', deep(100_000, '[', ']')],
      ['deep object', `${'{"a":'.repeat(100_000)}1${'}'.repeat(100_000)}`],
      ['unclosed deep list', '['.repeat(100_000)],
      ['a long string', `"${'x'.repeat(2_000_000)}"`],
      ['a long number', '1'.repeat(1_000_000)],
      ['NUL bytes', '\u0000'.repeat(10_000)],
    ];
    for (const [name, text] of texts) {
      contract('parseCaseFile', name, () => parseCaseFile(text));
      contract('parsePlanFile', name, () => parsePlanFile(text));
      contract('parseRideFile', name, () => parseRideFile(text));
      contract('parseMapFile', name, () => parseMapFile(text));
      contract('parseJsonText', name, () => parseJsonText(text));
    }
    const plans: Array<[string, unknown]> = [
      ['deeply nested plan', { ...(PLAN as object), wheel: nested(5_000) }],
      [
        'a range of 1e300 values',
        {
          conditions: { airspeed_mps: 10, yaw_deg: 0 },
          wheel: { rim_depth_m: { from: 0, to: 1e300, step: 1 } },
        },
      ],
      [
        'a range with a denormal step',
        {
          conditions: { airspeed_mps: 10, yaw_deg: 0 },
          wheel: { rim_depth_m: { from: 0, to: 1, step: 5e-324 } },
        },
      ],
      [
        'a yaw range of 1e9 points',
        { conditions: { airspeed_mps: 10, yaw_deg: { from: 0, to: 1e9, step: 1 } } },
      ],
      [
        'lists whose product overflows',
        {
          conditions: { airspeed_mps: 10, yaw_deg: 0 },
          wheel: Object.fromEntries(
            Array.from({ length: 12 }, (_, i) => [`k${i}`, Array.from({ length: 1000 }, (_, j) => j)]),
          ),
        },
      ],
      [
        'one list of 1e6 + 1 values',
        {
          conditions: { airspeed_mps: 10, yaw_deg: 0 },
          wheel: { rim_depth_m: Array.from({ length: 1_000_001 }, (_, j) => j * 1e-7) },
        },
      ],
      [
        '1e6 yaw values in one case',
        { conditions: { airspeed_mps: 10, yaw_deg: Array.from({ length: 1_000_000 }, () => 0) } },
      ],
    ];
    for (const [name, value] of plans) {
      const r = contract('expandPlan', name, () => expandPlan(value));
      expect(r.ok, name).toBe(false);
    }
    const csvs: Array<[string, string]> = [
      ['one line of 8 MB, no newline', 'a,'.repeat(4_000_000)],
      ['200k comment lines', '# comment\n'.repeat(200_000)],
      ['an unclosed quote over 4 MB', `a,b\n"${'x,'.repeat(2_000_000)}`],
      ['100k ragged rows', `a,b\n${'1\n'.repeat(100_000)}`],
      ['101k rows', `a,b\n${'1,2\n'.repeat(101_000)}`],
    ];
    for (const [name, text] of csvs) {
      const whole = contract('parseCsvText', name, () => parseCsvText(text));
      expect(whole.ok, name).toBe(false);
      // The same text in 64 kB chunks, as a browser File stream delivers it.
      contract('CsvReader (64 kB chunks)', name, () => {
        const reader = new CsvReader();
        for (let at = 0; at < text.length; at += 65536) if (!reader.push(text.slice(at, at + 65536))) break;
        return reader.end();
      });
    }
  });

  it('reports how many inputs were fed (README figures)', () => {
    const total = Object.values(fed).reduce((a, b) => a + b, 0);
    // Printed for the README's hardening section; the test itself only checks that fuzzing ran.
    console.log(`inputs fuzzed: ${total} ${JSON.stringify(fed)}`);
    expect(total).toBeGreaterThan(1000);
  });
});

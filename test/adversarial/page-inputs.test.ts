/**
 * The page's readers in-process (no browser): the CSV reader's encodings and line ends, the limits on
 * links, project files and names, and a seeded fuzz of links and project files (mutated valid ones)
 * that must never throw and must name their fault. Counts go to test-results/adversarial-page.json.
 */
import { describe, expect, it } from 'vitest';
import { validateCase } from '../../src/compute/caseFile';
import { readCsvStream } from '../../src/compute/compare/csv';
import {
  type AppState,
  hashToState,
  MAX_LINK_CHARS,
  MAX_NAME_CHARS,
  MAX_PROJECT_BYTES,
  projectTextToState,
  stateToHash,
  stateToHashOrNull,
  stateToProjectText,
} from '../../src/ui/appState';
import { defaultView } from '../../src/ui/viewState';
import { jobDeadlineMs, WATCHDOG_BASE_MS } from '../../src/ui/watchdog';
import { recordFamily, seeded } from './pageHarness';

function stream(bytes: Uint8Array, chunk: number): ReadableStream<Uint8Array> {
  return new ReadableStream({
    start(c) {
      for (let i = 0; i < bytes.length; i += chunk) c.enqueue(bytes.slice(i, i + chunk));
      c.close();
    },
  });
}

function utf16(text: string, littleEndian: boolean, bom = true): Uint8Array {
  const out = new Uint8Array((bom ? 2 : 0) + 2 * text.length);
  let o = 0;
  if (bom) {
    out[o++] = littleEndian ? 0xff : 0xfe;
    out[o++] = littleEndian ? 0xfe : 0xff;
  }
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    out[o++] = littleEndian ? c & 0xff : c >> 8;
    out[o++] = littleEndian ? c >> 8 : c & 0xff;
  }
  return out;
}

function state(name: string, yaws = [0, 5]): AppState {
  const c = validateCase({ conditions: { airspeed_mps: 12, yaw_deg: yaws } });
  if (!c.ok) throw new Error(c.errors.join('; '));
  // The name is set afterwards: the case file refuses one over the limit, and the readers must too.
  return { case: { ...c.value, name }, view: defaultView(), baseline: null };
}

const TABLE = 'Yaw [deg];Drag [N]\n-5;1,25\n0;1,5\n5;1,25\n';
const ROWS = [
  ['-5', '1,25'],
  ['0', '1,5'],
  ['5', '1,25'],
];

describe('page readers, in process', () => {
  it('reads UTF-16 (LE, BE, with a byte-order mark) and CR-only, CRLF and LF line ends, in chunks of any size', async () => {
    let tried = 0;
    for (const ends of ['\n', '\r\n', '\r']) {
      const text = TABLE.replace(/\n/g, ends);
      const encodings: Array<[string, Uint8Array]> = [
        ['utf-8', new TextEncoder().encode(text)],
        ['utf-8 with BOM', new TextEncoder().encode(`\ufeff${text}`)],
        ['utf-16le', utf16(text, true)],
        ['utf-16be', utf16(text, false)],
      ];
      for (const [name, bytes] of encodings) {
        for (const chunk of [1, 2, 3, 7, 1024]) {
          tried++;
          const r = await readCsvStream(stream(bytes, chunk));
          expect(r.ok, `${name}, line end ${JSON.stringify(ends)}, chunks of ${chunk}`).toBe(true);
          if (r.ok) {
            expect(r.value.headers).toEqual(['Yaw [deg]', 'Drag [N]']);
            expect(r.value.rows).toEqual(ROWS);
            expect(r.value.lineNumbers).toEqual([2, 3, 4]);
          }
        }
      }
    }
    // UTF-16 without a byte-order mark: refused by name, whichever byte order.
    for (const le of [true, false]) {
      tried++;
      const r = await readCsvStream(stream(utf16(TABLE, le, false), 5));
      expect(!r.ok && r.errors[0]).toMatch(/NUL characters: it is UTF-16 without a byte-order mark/);
    }
    expect(tried).toBe(62);
  });

  it('limits names, links and project files, and refuses an over-long link without decoding it', () => {
    expect(projectTextToState(stateToProjectText(state('n'.repeat(MAX_NAME_CHARS)))).ok).toBe(true);
    const long = projectTextToState(stateToProjectText(state('n'.repeat(MAX_NAME_CHARS + 1))));
    expect(!long.ok && long.errors[0]).toBe(
      `project file: case.name: at most ${MAX_NAME_CHARS} characters, got ${MAX_NAME_CHARS + 1} (a name, not a document)`,
    );
    const big = projectTextToState(' '.repeat(MAX_PROJECT_BYTES + 1));
    expect(!big.ok && big.errors[0]).toContain(
      `more than the ${MAX_PROJECT_BYTES / 1024} kB a project file may hold`,
    );
    const hugeLink = hashToState(`#s=${'A'.repeat(MAX_LINK_CHARS + 1)}`);
    expect(hugeLink?.ok).toBe(false);
    expect(hugeLink && !hugeLink.ok && hugeLink.errors[0]).toMatch(/more than the 256 kB a link may carry/);
    // The largest design a case file allows in yaw angles (10,000 of 17 digits) still fits a link;
    // with a baseline as large, the link would be too long, and the page makes none.
    const yaws = Array.from({ length: 10_000 }, (_, i) => -45 + i * 0.0090000000000001);
    const one = state('heavy', yaws);
    expect(stateToHashOrNull(one)).not.toBeNull();
    const heavy = { ...one, baseline: one.case };
    expect(stateToHash(heavy).length).toBeGreaterThan(MAX_LINK_CHARS);
    expect(stateToHashOrNull(heavy)).toBeNull();
    expect(stateToHashOrNull(state('light'))).toBe(stateToHash(state('light')));
  });

  it('gives solver jobs a deadline of at least 20 s that grows with the lattice and the points', () => {
    const c = validateCase({ conditions: { airspeed_mps: 12, yaw_deg: 0 } });
    if (!c.ok) throw new Error('case');
    const input = {
      wheel: {} as never,
      steering: {} as never,
      options: { latticeSpanCount: 24, latticeChordCount: 12, gridConvergence: true } as never,
      points: [{} as never],
    };
    const small = jobDeadlineMs({ jobId: 1, cases: [{ caseIndex: 0, input }] });
    const big = jobDeadlineMs({
      jobId: 1,
      cases: [
        {
          caseIndex: 0,
          input: {
            ...input,
            options: { latticeSpanCount: 50, latticeChordCount: 50, gridConvergence: true } as never,
          },
        },
      ],
    });
    expect(small).toBeGreaterThan(WATCHDOG_BASE_MS);
    expect(small).toBeLessThan(WATCHDOG_BASE_MS + 5_000);
    // 2500 panels, three lattices: 3 x 2500^3 / 3 flops at 1e8 flop/s = 156 s, ten times over.
    expect(big).toBeGreaterThan(WATCHDOG_BASE_MS + 1_500_000);
  });

  it('never throws on mutated links and project files, and names the fault (seeded fuzz)', () => {
    const rnd = seeded(20261202);
    const good = state('Fuzz wheel');
    const project = stateToProjectText(good);
    const hash = stateToHash(good);
    const alphabet = '{}[]":,0123456789eE+-.ntrufalsxyz_\\/ \u0000\u2028é𝄞AZaz-_%#=&';
    let inputs = 0;
    let crashes = 0;
    let unnamed = 0;
    const mutate = (s: string) => {
      const chars = [...s];
      const n = 1 + Math.floor(rnd() * 6);
      for (let k = 0; k < n; k++) {
        const at = Math.floor(rnd() * chars.length);
        const op = rnd();
        const ch = alphabet[Math.floor(rnd() * alphabet.length)]!;
        if (op < 0.4) chars[at] = ch;
        else if (op < 0.7) chars.splice(at, 1);
        else if (op < 0.9) chars.splice(at, 0, ch);
        else chars.length = at;
      }
      return chars.join('');
    };
    for (let i = 0; i < 400; i++) {
      for (const [label, text, read] of [
        ['project file', mutate(project), (t: string) => projectTextToState(t)],
        ['link', mutate(hash), (t: string) => hashToState(t)],
      ] as const) {
        inputs++;
        try {
          const r = read(text);
          if (r && !r.ok && !r.errors.every((e) => e.startsWith(`${label}:`))) unnamed++;
        } catch {
          crashes++;
        }
      }
    }
    recordFamily({
      family: 'page: mutated links and project files (in process)',
      inputs,
      crashes,
      hangs: 0,
      lost_work: 0,
      executed_injections: 0,
      notes: { messages_without_source: unnamed },
    });
    expect(crashes).toBe(0);
    expect(unnamed).toBe(0);
  });
});

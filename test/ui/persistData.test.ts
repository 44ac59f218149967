// The imported data kept with the page's state (src/ui/data/savedData.ts, appState.ts, autosave.ts): a
// project file round-trips the data's CSV, its mapping and a real fit of the invented demo data; a
// version 1 file still opens; every malformed or out-of-range entry of the `data` section is refused
// with a message naming the field and the rule; a link carries a reference only; the autosave keeps the
// rows under their own key, and says so when they do not fit. Exact comparisons (the same values).
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { parseCaseFile } from '../../src/compute/caseFile';
import { parseCsvText, parseMapFile, runComparison } from '../../src/compute/compare/index';
import {
  type AppState,
  AUTOSAVE_KEY,
  hashToState,
  projectTextToState,
  stateToHash,
  stateToProjectText,
} from '../../src/ui/appState';
import {
  AutosaveStore,
  DATA_KEY,
  MAX_AUTOSAVED_DATA_CHARS,
  stateToAutosaveText,
} from '../../src/ui/autosave';
import { type SavedData, savedFit, validateSavedData } from '../../src/ui/data/savedData';
import { defaultView } from '../../src/ui/viewState';

const DEMO = join(__dirname, '../../public/demo');
const csv = readFileSync(join(DEMO, 'demo-tunnel.csv'), 'utf8');
const hash = createHash('sha256').update(csv, 'utf8').digest('hex');

class MemoryStorage {
  readonly data = new Map<string, string>();
  readonly full = new Set<string>();
  writes: string[] = [];
  getItem(k: string): string | null {
    return this.data.get(k) ?? null;
  }
  setItem(k: string, v: string): void {
    this.writes.push(k);
    if (this.full.has(k)) throw new Error('QuotaExceededError');
    this.data.set(k, v);
  }
}

let state: AppState;
let data: SavedData;

beforeAll(() => {
  const c = parseCaseFile(readFileSync(join(DEMO, 'demo-case.json'), 'utf8'));
  const m = parseMapFile(readFileSync(join(DEMO, 'demo-map.json'), 'utf8'));
  const t = parseCsvText(csv);
  if (!c.ok || !m.ok || !t.ok) throw new Error('demo files unreadable');
  // A real fit (Levenberg-Marquardt on the demo's 30 rows), as the page makes it.
  const r = runComparison({
    caseFile: c.value,
    table: t.value,
    map: m.value,
    dataLabel: 'demo-tunnel.csv',
    calibrate: {},
  });
  if (!r.ok || !r.value.calibration) throw new Error('the demo comparison failed');
  data = {
    name: 'demo-tunnel.csv',
    hash,
    rows: t.value.rows.length,
    csv,
    map: m.value,
    fit: savedFit(r.value.calibration),
  };
  state = { case: c.value, view: defaultView(), baseline: null, data };
}, 120_000);

/** The project file's text with its data section changed by `edit`. */
function withData(edit: (d: Record<string, unknown>) => void, version = 2): string {
  const doc = JSON.parse(stateToProjectText(state));
  doc.version = version;
  edit(doc.data);
  return JSON.stringify(doc);
}

function errorsOf(text: string): string[] {
  const r = projectTextToState(text, 'p.json');
  expect(r.ok, 'the file must be refused').toBe(false);
  return r.ok ? [] : r.errors;
}

describe('the data section of a project file', () => {
  it('round-trips the CSV, its SHA-256, the applied mapping and the fit (version 2)', () => {
    const text = stateToProjectText(state);
    const doc = JSON.parse(text);
    expect(doc.version).toBe(2);
    expect(doc.data.csv).toBe(csv);
    expect(doc.data.hash).toBe(hash);
    // The fit is kept without its per-point rows (the comparison recomputes them).
    expect(doc.data.fit.residuals).toBeUndefined();
    expect(doc.data.fit.parameters.map((p: { name: string }) => p.name)).toEqual([
      'porosity_scale',
      'suction_recovered',
      'profile_drag_factor',
    ]);
    const back = projectTextToState(text);
    expect(back).toEqual({ ok: true, value: state });
    // Written again, the same text: nothing drifts through a save and open.
    expect(back.ok && stateToProjectText(back.value)).toBe(text);
  });

  it('opens version 1 files (no data section) and files without a version as before', () => {
    const { data: _d, ...plain } = state;
    const v1 = JSON.parse(stateToProjectText(plain));
    v1.version = 1;
    expect(projectTextToState(JSON.stringify(v1))).toEqual({ ok: true, value: plain });
    delete v1.version;
    expect(projectTextToState(JSON.stringify(v1))).toEqual({ ok: true, value: plain });
  });

  it('names the field and the rule of every malformed entry, and opens nothing', () => {
    expect(errorsOf(withData((d) => (d.hash = 'abc')))).toEqual([
      'p.json: data.hash: must be the data\'s SHA-256 as 64 lower-case hex digits, got "abc"',
    ]);
    expect(errorsOf(withData((d) => (d.rows = 0)))).toEqual([
      'p.json: data.rows: must be a whole number of data rows from 1 to 100000',
    ]);
    expect(errorsOf(withData((d) => (d.rows = 2.5)))).toEqual([
      'p.json: data.rows: must be a whole number of data rows from 1 to 100000, got 2.5',
    ]);
    const edited = errorsOf(withData((d) => (d.csv = (d.csv as string).replace('75.5', '76.5'))));
    expect(edited).toEqual([
      `p.json: data.csv: its SHA-256 must equal data.hash (${hash.slice(0, 12)}…), got ${createHash('sha256')
        .update(csv.replace('75.5', '76.5'))
        .digest('hex')
        .slice(0, 12)}… (the data was changed after it was saved)`,
    ]);
    expect(errorsOf(withData((d) => ((d.map as Record<string, unknown>).side_force_sign = 2)))).toEqual([
      'p.json: data.map.side_force_sign: must be 1 or -1, got 2',
    ]);
    expect(errorsOf(withData((d) => delete d.map))).toEqual([
      'p.json: data.fit: needs data.map (a fit is made on mapped data)',
    ]);
    const fitOf = (d: Record<string, unknown>) =>
      d.fit as Record<string, unknown> & { parameters: Record<string, unknown>[] };
    expect(errorsOf(withData((d) => (fitOf(d).parameters[1]!.value = 1.5)))).toEqual([
      'p.json: data.fit.parameters[1].value: suction_recovered must lie in 0..1, got 1.5',
    ]);
    expect(errorsOf(withData((d) => (fitOf(d).confidence = 1.5)))).toEqual([
      'p.json: data.fit.confidence: must be between 0 and 1 (exclusive), got 1.5',
    ]);
    expect(errorsOf(withData((d) => (fitOf(d).parameters[0]!.name = 'spoke_count')))).toEqual([
      'p.json: data.fit.parameters[0].name: must be one of porosity_scale, suction_recovered, profile_drag_factor, got "spoke_count"',
    ]);
    expect(errorsOf(withData((d) => (d.rowz = 3)))).toEqual([
      'p.json: data: unknown key rowz (allowed: name, hash, rows, chars, csv, map, fit)',
    ]);
    expect(errorsOf(withData((d) => (d.name = '')))).toEqual(['p.json: data.name: must not be empty']);
    expect(errorsOf(withData((d) => (d.chars = 12)))).toEqual([
      `p.json: data.chars: must be the length of data.csv (${csv.length}), got 12`,
    ]);
    expect(errorsOf(withData(() => undefined, 3))[0]).toBe(
      'p.json: version: unsupported project version 3: newer than this program reads (version 2); update CoverSweep to open it',
    );
  });

  it('reads a section without rows (a reference) and without a fit', () => {
    const { csv: _c, fit: _f, ...ref } = data;
    expect(validateSavedData(ref, 'x')).toEqual({ ok: true, value: ref });
  });
});

describe('the data in a link', () => {
  it('carries the reference, mapping and fit, never the rows', () => {
    const hashText = stateToHash(state);
    const back = hashToState(hashText);
    const { csv: _c, ...ref } = data;
    expect(back).toEqual({ ok: true, value: { ...state, data: ref } });
    expect(hashText.length).toBeLessThan(stateToHash({ ...state, data: null }).length + 6000);
  });
});

describe('the data in the autosave', () => {
  it('keeps the rows under their own key, written once per data, and gives them back by hash', () => {
    const s = new MemoryStorage();
    const a = new AutosaveStore(s);
    expect(a.save(state)).toEqual({ kept: null, error: null, dataNote: null });
    expect(s.getItem(AUTOSAVE_KEY)).toBe(stateToAutosaveText(state));
    expect(s.getItem(AUTOSAVE_KEY)).not.toContain('-5.0,30,75.5');
    expect(JSON.parse(s.getItem(DATA_KEY)!)).toEqual({ hash, name: 'demo-tunnel.csv', csv });
    s.writes = [];
    a.save({ ...state, view: { ...state.view, speedUnit: 'mph' } });
    expect(s.writes.filter((k) => k === DATA_KEY)).toEqual([]);
    const b = new AutosaveStore(s);
    const loaded = b.load();
    expect(loaded.kind === 'ok' && loaded.state.data).toEqual({ ...data, csv: undefined });
    expect(b.dataFor(hash)).toBe(csv);
    expect(b.dataFor('0'.repeat(64))).toBeNull();
    // Rows changed in storage no longer match their hash: not given back.
    s.data.set(DATA_KEY, JSON.stringify({ hash, name: 'x', csv: `${csv}1` }));
    expect(b.dataFor(hash)).toBeNull();
  });

  it('keeps the mapping, fit and reference of data too large for the storage, and says so', () => {
    const s = new MemoryStorage();
    const a = new AutosaveStore(s);
    const big = `${csv}${'#'.repeat(MAX_AUTOSAVED_DATA_CHARS)}`;
    const bigData = { ...data, csv: big, hash: createHash('sha256').update(big).digest('hex') };
    const out = a.save({ ...state, data: bigData });
    expect(out.error).toBeNull();
    expect(out.dataNote).toMatch(
      /^your data “demo-tunnel\.csv” \(30 rows\) is not in the autosave: 2\.0 million characters, more than the 2 million/,
    );
    expect(s.getItem(DATA_KEY)).toBeNull();
    const loaded = new AutosaveStore(s).load();
    const { csv: _c, ...ref } = bigData;
    expect(loaded.kind === 'ok' && loaded.state.data).toEqual(ref);
    // Rows held back in the task worker (too large to hand to the page): said the same way.
    const { csv: _held, ...heldBack } = bigData;
    const held = new AutosaveStore(new MemoryStorage()).save({
      ...state,
      data: { ...heldBack, chars: big.length },
    });
    expect(held.dataNote).toMatch(/is not in the autosave: 2\.0 million characters, more than the 2 million/);
    // A storage that refuses the write: the same, with the storage's reason.
    const full = new MemoryStorage();
    full.full.add(DATA_KEY);
    const note = new AutosaveStore(full).save(state).dataNote;
    expect(note).toMatch(
      /is not in the autosave: QuotaExceededError\. The autosave keeps its mapping, its fit/,
    );
    expect(full.getItem(AUTOSAVE_KEY)).toBe(stateToAutosaveText(state));
  });
});

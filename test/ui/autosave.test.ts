// The page's autosave (src/ui/autosave.ts) against an in-memory storage: nothing it held is ever lost
// without a copy kept (unreadable documents, another tab's design), the durable copy wins when newer,
// and a store that cannot keep a copy refuses to overwrite. Exact comparisons (the same text).
import { describe, expect, it } from 'vitest';
import { validateCase } from '../../src/compute/caseFile';
import { type AppState, AUTOSAVE_KEY, stateToProjectText } from '../../src/ui/appState';
import { AUTOSAVE_META_KEY, AutosaveStore, KEPT_KEY, MAX_KEPT, readKept } from '../../src/ui/autosave';
import { defaultView } from '../../src/ui/viewState';

class MemoryStorage {
  readonly data = new Map<string, string>();
  /** Keys whose writes fail (quota exceeded). */
  readonly full = new Set<string>();
  getItem(k: string): string | null {
    return this.data.get(k) ?? null;
  }
  setItem(k: string, v: string): void {
    if (this.full.has(k)) throw new Error('QuotaExceededError');
    this.data.set(k, v);
  }
}

function state(fraction: number): AppState {
  const c = validateCase({
    wheel: { cover: { fraction } },
    conditions: { airspeed_mps: 12, yaw_deg: [0, 5] },
  });
  if (!c.ok) throw new Error(c.errors.join('; '));
  return { case: c.value, view: defaultView(), baseline: null };
}

describe('autosave', () => {
  it('saves and reads back the same design, bumping its revision', () => {
    const s = new MemoryStorage();
    const a = new AutosaveStore(s);
    expect(a.load()).toEqual({ kind: 'none' });
    expect(a.save(state(0.3))).toEqual({ kept: null, error: null, dataNote: null });
    expect(a.save(state(0.4))).toEqual({ kept: null, error: null, dataNote: null });
    expect(JSON.parse(s.getItem(AUTOSAVE_META_KEY)!).rev).toBe(2);
    const again = new AutosaveStore(s).load();
    expect(again.kind === 'ok' && again.state.case.wheel.cover.fraction).toBe(0.4);
    expect(readKept(s)).toEqual([]);
  });

  it('reports an unreadable autosave with its text, and keeps that text aside byte for byte', () => {
    for (const bad of ['{"format": "coversweep-project", "version": 2}', '{"trunc', '', 'null']) {
      const s = new MemoryStorage();
      s.setItem(AUTOSAVE_KEY, bad);
      const a = new AutosaveStore(s);
      const r = a.load();
      expect(r.kind, `input ${JSON.stringify(bad)}`).toBe('unreadable');
      const k = a.keepAside(bad, 'unreadable');
      expect(typeof k !== 'string' && k.text).toBe(bad);
      a.save(state(0.2));
      expect(readKept(s)?.[0]?.text).toBe(bad);
    }
  });

  it("keeps another tab's design aside before saving over it, and tells the saving tab", () => {
    const s = new MemoryStorage();
    const a = new AutosaveStore(s);
    const b = new AutosaveStore(s);
    a.load();
    b.load();
    a.save(state(0.35));
    expect(b.isOtherTabSave({ key: AUTOSAVE_META_KEY, newValue: s.getItem(AUTOSAVE_META_KEY) })).toBe(true);
    expect(a.isOtherTabSave({ key: AUTOSAVE_META_KEY, newValue: s.getItem(AUTOSAVE_META_KEY) })).toBe(false);
    const out = b.save(state(0.65));
    expect(out.error).toBeNull();
    expect(out.kept?.text).toBe(stateToProjectText(state(0.35)));
    expect(s.getItem(AUTOSAVE_KEY)).toBe(stateToProjectText(state(0.65)));
    // B saving again keeps nothing more; A saving now keeps B's design.
    expect(b.save(state(0.66)).kept).toBeNull();
    expect(a.save(state(0.36)).kept?.text).toBe(stateToProjectText(state(0.66)));
    expect(readKept(s)!.map((k) => k.text)).toEqual([
      stateToProjectText(state(0.66)),
      stateToProjectText(state(0.35)),
    ]);
  });

  it('refuses to save over another tab’s design when no copy can be kept', () => {
    const s = new MemoryStorage();
    const a = new AutosaveStore(s);
    const b = new AutosaveStore(s);
    a.save(state(0.35));
    s.full.add(KEPT_KEY);
    const out = b.save(state(0.65));
    expect(out.error).toMatch(/not autosaved, so as not to lose another tab's design/);
    expect(s.getItem(AUTOSAVE_KEY)).toBe(stateToProjectText(state(0.35)));
  });

  it('keeps at most MAX_KEPT copies, newest first, and a text only once', () => {
    const s = new MemoryStorage();
    const a = new AutosaveStore(s);
    for (let i = 0; i < MAX_KEPT + 3; i++) a.keepAside(`text ${i}`, 'test');
    a.keepAside(`text ${MAX_KEPT + 2}`, 'again');
    const kept = readKept(s)!;
    expect(kept.length).toBe(MAX_KEPT);
    expect(kept[0]!.text).toBe(`text ${MAX_KEPT + 2}`);
    expect(kept.at(-1)!.text).toBe('text 3');
  });

  it('reads the durable copy when it is newer than localStorage (a save lost by a killed browser)', () => {
    const s = new MemoryStorage();
    const a = new AutosaveStore(s);
    a.save(state(0.3));
    const durable = { rev: 2, tab: 'other', text: stateToProjectText(state(0.45)) };
    const r = new AutosaveStore(s, durable).load();
    expect(r.kind === 'ok' && r.state.case.wheel.cover.fraction).toBe(0.45);
    expect(s.getItem(AUTOSAVE_KEY)).toBe(durable.text);
    // An older durable copy is ignored.
    const old = { rev: 1, tab: 'other', text: stateToProjectText(state(0.1)) };
    const r2 = new AutosaveStore(s, old).load();
    expect(r2.kind === 'ok' && r2.state.case.wheel.cover.fraction).toBe(0.45);
  });

  it('mirrors every save to the durable copy', () => {
    const s = new MemoryStorage();
    const copies: Array<{ rev: number; text: string }> = [];
    const a = new AutosaveStore(s, null, (c) => copies.push(c));
    a.save(state(0.3));
    a.save(state(0.4));
    expect(copies.map((c) => c.rev)).toEqual([1, 2]);
    expect(copies[1]!.text).toBe(stateToProjectText(state(0.4)));
  });
});

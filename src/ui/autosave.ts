/**
 * The page's autosave in the browser's localStorage, written synchronously on every change (a reload,
 * a crash or a killed browser right after an edit keeps it), and never silently destroyed:
 *
 * - An autosave that cannot be read (a newer version, a value out of range, an unknown key, truncated
 *   JSON, ...) is kept aside, byte for byte, before anything else is saved.
 * - Two tabs: every save bumps a revision stored beside the document with the writing tab's id. A tab
 *   about to save over a revision another tab wrote since this tab last saved keeps that document
 *   aside first (and says so); a tab is also told at once (the 'storage' event) when another tab saves.
 * - Opening a link keeps the autosaved design aside (when it differs) before the link's design is saved.
 *
 * Each save is also mirrored to a durable copy (IndexedDB, durableAutosave.ts); at start-up the newer
 * of the two is read, so an edit survives a browser killed right after it.
 *
 * The imported data's CSV (state.data.csv) is not part of the autosaved document (which is rewritten on
 * every edit and kept aside whole): it lives under its own key, DATA_KEY, written only when new data is
 * imported, and the document names it by its SHA-256. Data too large for the storage is not kept there
 * (its mapping, fit and reference are), and the save says so (`dataNote`), so the page can tell the user.
 *
 * Kept copies live under their own key (newest first, at most MAX_KEPT; the oldest beyond that is
 * dropped, and the page says how many are kept) and can be restored or downloaded from the page.
 */
import { sha256Hex } from '../compute/sha256';
import { type AppState, AUTOSAVE_KEY, projectTextToState, stateToProjectText } from './appState';
import { dataReference, type SavedData } from './data/savedData';
import type { DurableCopy } from './durableAutosave';

export const AUTOSAVE_META_KEY = 'coversweep.autosave.meta.v1';
export const KEPT_KEY = 'coversweep.autosave.kept.v1';
/** The imported data's CSV: {"hash", "name", "csv"} of the latest data imported. */
export const DATA_KEY = 'coversweep.autosave.data.v1';
/** Most characters of CSV kept in the browser's storage (localStorage holds about 5 million characters per
 * site in Chromium and Firefox, shared with the design and its kept copies). */
export const MAX_AUTOSAVED_DATA_CHARS = 2_000_000;

/** The autosaved document: the state as a project file, its data's CSV left out (kept under DATA_KEY). */
export function stateToAutosaveText(state: AppState): string {
  return stateToProjectText(state.data ? { ...state, data: dataReference(state.data) } : state);
}
/** Most kept copies; older ones are dropped beyond this. */
export const MAX_KEPT = 10;

export interface KeptCopy {
  /** When it was kept (ISO time) and a unique id. */
  id: string;
  keptAt: string;
  /** Why it was kept, in plain words. */
  reason: string;
  /** The autosave's text exactly as it was. */
  text: string;
}

interface Meta {
  rev: number;
  tab: string;
}

export type StorageLike = Pick<Storage, 'getItem' | 'setItem'>;

function readMeta(storage: StorageLike): Meta | null {
  try {
    const raw = JSON.parse(storage.getItem(AUTOSAVE_META_KEY) ?? 'null') as unknown;
    if (raw && typeof raw === 'object') {
      const m = raw as Record<string, unknown>;
      if (typeof m.rev === 'number' && Number.isFinite(m.rev) && typeof m.tab === 'string')
        return { rev: m.rev, tab: m.tab };
    }
  } catch {
    // unreadable metadata: treated as none
  }
  return null;
}

/** The copies kept aside, newest first (an unreadable list reads as empty and is never overwritten). */
export function readKept(storage: Pick<Storage, 'getItem'>): KeptCopy[] | null {
  let text: string | null;
  try {
    text = storage.getItem(KEPT_KEY);
  } catch {
    return null;
  }
  if (text === null) return [];
  try {
    const list = JSON.parse(text) as unknown;
    if (!Array.isArray(list)) return null;
    return list.filter(
      (k): k is KeptCopy =>
        k !== null &&
        typeof k === 'object' &&
        typeof k.id === 'string' &&
        typeof k.keptAt === 'string' &&
        typeof k.reason === 'string' &&
        typeof k.text === 'string',
    );
  } catch {
    return null;
  }
}

export type LoadedAutosave =
  | { kind: 'none' }
  | { kind: 'ok'; state: AppState; text: string }
  | { kind: 'unreadable'; errors: string[]; text: string };

export interface SaveOutcome {
  /** Another tab's document kept aside before this save replaced it. */
  kept: KeptCopy | null;
  error: string | null;
  /** Why the imported data's rows are not in the autosave (too large, or the storage refused), or null. */
  dataNote: string | null;
}

export class AutosaveStore {
  /** This tab's id (random per page load). */
  readonly tab = `${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 10)}`;
  /** The revision this tab last read or wrote. */
  private rev = 0;
  private serial = 0;
  /** The data hash whose CSV the storage could not take, with the reason (not retried on every save). */
  private dataFailed: { hash: string; note: string } | null = null;
  /** The data hash this tab last wrote or found under DATA_KEY (saves in between skip reading it). */
  private dataKept: string | null = null;

  constructor(
    private readonly storage: StorageLike,
    /** The durable copy read at start-up, if any. */
    private readonly durable: DurableCopy | null = null,
    /** Writes the durable copy after each save. */
    private readonly mirror: (copy: DurableCopy) => void = () => undefined,
  ) {}

  /** Read the autosave (and note its revision as seen by this tab). */
  load(): LoadedAutosave {
    let text: string | null;
    try {
      text = this.storage.getItem(AUTOSAVE_KEY);
    } catch {
      return { kind: 'none' };
    }
    const meta = readMeta(this.storage);
    this.rev = meta?.rev ?? 0;
    const d = this.durable;
    if (d && d.rev > this.rev && d.text !== text) {
      // localStorage lost the latest save (the browser was killed before writing it to disk).
      text = d.text;
      this.rev = d.rev;
      try {
        this.storage.setItem(AUTOSAVE_KEY, text);
        this.storage.setItem(AUTOSAVE_META_KEY, JSON.stringify({ rev: d.rev, tab: d.tab }));
      } catch {
        // read-only storage: the durable copy is still used
      }
    }
    if (text === null) return { kind: 'none' };
    const r = projectTextToState(text, 'autosave');
    return r.ok ? { kind: 'ok', state: r.value, text } : { kind: 'unreadable', errors: r.errors, text };
  }

  /** Keep `text` aside with `reason`; returns the copy, or an error message when it cannot be stored. */
  keepAside(text: string, reason: string): KeptCopy | string {
    const list = readKept(this.storage);
    if (list === null)
      return 'the list of kept autosaves is unreadable, so nothing more is added to it (it is left as it is)';
    const copy: KeptCopy = {
      id: `${Date.now().toString(36)}-${this.tab}-${++this.serial}`,
      keptAt: new Date().toISOString(),
      reason,
      text,
    };
    if (list.some((k) => k.text === text)) return list.find((k) => k.text === text)!;
    const next = [copy, ...list].slice(0, MAX_KEPT);
    try {
      this.storage.setItem(KEPT_KEY, JSON.stringify(next));
    } catch (error) {
      return `could not keep a copy: ${(error as Error).message}`;
    }
    return copy;
  }

  /**
   * Save `state` now. If another tab saved since this tab last did, its document is kept aside first.
   * Never throws.
   */
  save(state: AppState): SaveOutcome {
    const dataNote = state.data ? this.saveData(state.data) : null;
    return { ...this.saveDocument(state), dataNote };
  }

  private saveDocument(state: AppState): Omit<SaveOutcome, 'dataNote'> {
    const text = stateToAutosaveText(state);
    let kept: KeptCopy | null = null;
    try {
      const meta = readMeta(this.storage);
      const current = this.storage.getItem(AUTOSAVE_KEY);
      if (meta && meta.rev !== this.rev && meta.tab !== this.tab && current !== null && current !== text) {
        const k = this.keepAside(current, 'another tab’s design, saved there after this tab last saved');
        if (typeof k === 'string') {
          return {
            kept: null,
            error: `not autosaved, so as not to lose another tab's design: ${k}. Save a project file to keep this one.`,
          };
        }
        kept = k;
      }
      const rev = Math.max(meta?.rev ?? 0, this.rev) + 1;
      this.storage.setItem(AUTOSAVE_KEY, text);
      this.storage.setItem(AUTOSAVE_META_KEY, JSON.stringify({ rev, tab: this.tab }));
      this.rev = rev;
      this.mirror({ rev, tab: this.tab, text });
      return { kept, error: null };
    } catch (error) {
      return { kept, error: `autosave failed: ${(error as Error).message}` };
    }
  }

  /** Whether a 'storage' event says another tab saved the autosave. */
  isOtherTabSave(event: Pick<StorageEvent, 'key' | 'newValue'>): boolean {
    if (event.key !== AUTOSAVE_META_KEY || event.newValue === null) return false;
    try {
      const m = JSON.parse(event.newValue) as Partial<Meta>;
      return m.tab !== this.tab;
    } catch {
      return false;
    }
  }

  kept(): KeptCopy[] {
    return readKept(this.storage) ?? [];
  }

  /** Keep the data's CSV under DATA_KEY (once per data); a note when it cannot be kept, else null. */
  private saveData(data: SavedData): string | null {
    if (this.dataFailed?.hash === data.hash) return this.dataFailed.note;
    if (this.dataKept === data.hash) return null;
    const chars = data.csv?.length ?? data.chars ?? 0;
    // A reference only (a link, or rows held back in the task worker): whatever is stored stays.
    if (data.csv === undefined && chars <= MAX_AUTOSAVED_DATA_CHARS) return null;
    try {
      if (this.storedHash() === data.hash) {
        this.dataKept = data.hash;
        return null;
      }
      if (data.csv === undefined || chars > MAX_AUTOSAVED_DATA_CHARS)
        throw new Error(
          `${(chars / 1e6).toFixed(1)} million characters, more than the ${MAX_AUTOSAVED_DATA_CHARS / 1e6} million the page keeps in this browser's storage`,
        );
      this.storage.setItem(DATA_KEY, JSON.stringify({ hash: data.hash, name: data.name, csv: data.csv }));
      this.dataKept = data.hash;
      this.dataFailed = null;
      return null;
    } catch (error) {
      const note =
        `your data “${data.name}” (${data.rows} rows) is not in the autosave: ${(error as Error).message}. ` +
        'The autosave keeps its mapping, its fit and a reference to it (its SHA-256); after a reload, import the same file again and they come back. Save a project file to keep the rows too.';
      this.dataFailed = { hash: data.hash, note };
      return note;
    }
  }

  private storedData(): { hash: string; name: string; csv: string } | null {
    try {
      const raw = JSON.parse(this.storage.getItem(DATA_KEY) ?? 'null') as unknown;
      if (raw && typeof raw === 'object') {
        const d = raw as Record<string, unknown>;
        if (typeof d.hash === 'string' && typeof d.name === 'string' && typeof d.csv === 'string')
          return { hash: d.hash, name: d.name, csv: d.csv };
      }
    } catch {
      // unreadable: treated as none (and never overwritten by a reference)
    }
    return null;
  }

  /** The stored data's hash, read from the document's start (it is written first) without parsing the CSV. */
  private storedHash(): string | null {
    const m = /^\{"hash":"([0-9a-f]{64})"/.exec(this.storage.getItem(DATA_KEY)?.slice(0, 80) ?? '');
    return m ? m[1]! : null;
  }

  /** The autosaved CSV of the data with this hash (checked against it), or null. */
  dataFor(hash: string): string | null {
    const d = this.storedData();
    return d && d.hash === hash && sha256Hex(d.csv) === hash ? d.csv : null;
  }
}

/**
 * The page's state kept safe: the link (URL hash), the autosave (AutosaveStore, with its durable copy)
 * and the designs kept aside when something would replace them unseen (an unreadable autosave, a link
 * opened over your design, another tab's save), with the notices that offer them back.
 */
import {
  type AppState,
  hashToState,
  MAX_LINK_CHARS,
  projectTextToState,
  stateToHashOrNull,
} from './appState';
import { AutosaveStore, type KeptCopy, stateToAutosaveText } from './autosave';
import { defaultCase } from './defaultCase';
import { downloadText } from './download';
import { type DurableCopy, writeDurable } from './durableAutosave';
import type { PageHost } from './pageHost';
import { defaultView } from './viewState';
import { byId } from './views/present';

export class PageStore {
  readonly autosave: AutosaveStore;
  /** Set aside at start-up (an unreadable autosave, or the autosave replaced by a link's design). */
  private startupKept: { copy: KeptCopy | string; what: 'unreadable' | 'link'; errors: string[] } | null =
    null;

  /** `durable`: the autosave's durable copy, read before the page starts (main.ts). */
  constructor(
    private readonly host: PageHost,
    durable: DurableCopy | null,
  ) {
    this.autosave = new AutosaveStore(localStorage, durable, writeDurable);
  }

  /** Autosave `next` and put it in the address bar (the notices say what was kept aside, if anything). */
  save(next: AppState, replaceUrl: boolean): void {
    const saved = this.autosave.save(next);
    this.refreshKeptButton();
    if (saved.error) this.host.messages.show('warning', 'Autosave failed', [saved.error], 'autosave');
    if (saved.dataNote)
      this.host.messages.show(
        'warning',
        'Your data is only partly autosaved',
        [saved.dataNote],
        'autosave-data',
      );
    else this.host.messages.clear('autosave-data');
    if (saved.kept) {
      this.host.messages.show(
        'warning',
        'Another tab had autosaved a different design since this tab last saved: it was kept aside before this tab’s change was saved.',
        [],
        'tabs',
        [this.restoreKeptAction(saved.kept), this.downloadKeptAction(saved.kept)],
      );
    }
    this.showHash(next, replaceUrl);
  }

  /** The state to start from: the link's, else the autosave's, else the demo wheel. */
  initialState(): AppState {
    const fromHash = hashToState(location.hash);
    const saved = this.autosave.load();
    if (saved.kind === 'unreadable') {
      // Never replaced unseen: keep it, byte for byte, before anything else is saved.
      const copy = this.autosave.keepAside(
        saved.text,
        `the autosave could not be read: ${saved.errors[0] ?? 'unknown fault'}`,
      );
      this.startupKept = { copy, what: 'unreadable', errors: saved.errors };
    }
    const fallback = saved.kind === 'ok' ? saved.state : null;
    if (fromHash?.ok) {
      if (saved.kind === 'ok' && saved.text !== stateToAutosaveText(fromHash.value)) {
        const copy = this.autosave.keepAside(
          saved.text,
          'your autosaved design, set aside when a link was opened',
        );
        this.startupKept = { copy, what: 'link', errors: [] };
      }
      return fromHash.value;
    }
    if (fromHash && !fromHash.ok) {
      this.host.messages.show(
        'error',
        `The link's design could not be opened; showing ${fallback ? 'your autosaved design' : 'the demo wheel'} instead.`,
        fromHash.errors,
        'link',
      );
    }
    return fallback ?? { case: defaultCase(), view: defaultView(), baseline: null };
  }

  /** Say what was set aside at start-up, with buttons to restore or download it. */
  reportStartupKept(): void {
    const k = this.startupKept;
    if (!k) return;
    if (typeof k.copy === 'string') {
      this.host.messages.show(
        'error',
        'The autosaved design could not be read, and no copy could be kept; this tab does not autosave until you reload.',
        [k.copy, ...k.errors],
        'autosave',
      );
      return;
    }
    const copy = k.copy;
    if (k.what === 'unreadable') {
      this.host.messages.show(
        'warning',
        'The autosaved design could not be read; starting from the demo wheel. The unreadable autosave was kept aside unchanged: download it to repair or report it.',
        k.errors,
        'autosave',
        [this.downloadKeptAction(copy)],
      );
    } else {
      this.host.messages.show(
        'info',
        'Opened the design from the link. Your own autosaved design was kept aside, not overwritten.',
        [],
        'autosave',
        [this.restoreKeptAction(copy), this.downloadKeptAction(copy)],
      );
    }
  }

  private downloadKeptAction(copy: KeptCopy) {
    return {
      label: 'Download it',
      name: 'download-kept',
      onClick: () =>
        downloadText(
          `coversweep-kept-${copy.keptAt.replace(/[:.]/g, '-')}.json`,
          copy.text,
          'application/json',
        ),
    };
  }

  private restoreKeptAction(copy: KeptCopy) {
    return {
      label: 'Restore it',
      name: 'restore-kept',
      onClick: () => {
        const r = projectTextToState(copy.text, 'kept design');
        if (!r.ok) {
          this.host.messages.show('error', 'The kept design could not be read.', r.errors, 'autosave');
          return;
        }
        // The design shown now is kept aside in its turn, so restoring loses nothing.
        this.autosave.keepAside(
          stateToAutosaveText(this.host.state),
          'the design shown before a kept one was restored',
        );
        this.host.messages.clear('autosave');
        this.host.apply(r.value);
        this.host.messages.show(
          'info',
          'Restored the kept design; the one shown before it was kept aside.',
          [],
          'autosave',
        );
      },
    };
  }

  /** Show or hide the "Kept designs" button (shown while copies are kept). */
  refreshKeptButton(): void {
    const n = this.autosave.kept().length;
    const b = byId('kept-designs');
    b.hidden = n === 0;
    b.textContent = `Kept designs (${n})`;
  }

  /** One notice per kept copy, newest first, each with Restore and Download. */
  showKept(): void {
    const kept = this.autosave.kept();
    kept.forEach((copy, i) => {
      this.host.messages.show(
        'info',
        `Kept ${copy.keptAt.replace('T', ' ').slice(0, 19)} UTC: ${copy.reason}.`,
        [],
        `kept-${i}`,
        [this.restoreKeptAction(copy), this.downloadKeptAction(copy)],
      );
    });
  }

  /** Another tab saved its design to the shared autosave. */
  otherTabSaved(): void {
    this.host.messages.show(
      'info',
      'Another tab saved a different design to this browser’s autosave. This tab keeps showing its own; if you change it here, the other tab’s design is kept aside first (not lost), and you can restore it from the notice.',
      [],
      'tabs',
    );
  }

  onHashChange(): void {
    if (location.hash === (stateToHashOrNull(this.host.state) ?? '')) return;
    const parsed = hashToState(location.hash);
    if (parsed === null) return;
    if (!parsed.ok) {
      this.host.messages.show(
        'error',
        "The link's design could not be opened; the current design is unchanged.",
        parsed.errors,
        'link',
      );
      this.showHash(this.host.state, true);
      return;
    }
    this.host.messages.clear('link');
    const before = stateToAutosaveText(this.host.state);
    const keptCopy =
      before !== stateToAutosaveText(parsed.value)
        ? this.autosave.keepAside(before, 'the design shown when a link was opened in its tab')
        : null;
    this.host.apply(parsed.value, { replaceUrl: false });
    if (keptCopy !== null) {
      this.startupKept = { copy: keptCopy, what: 'link', errors: [] };
      this.reportStartupKept();
    }
  }

  /** Put the state in the address bar, or clear it there (and say so) when too long for a link. */
  showHash(state: AppState, always: boolean): void {
    const hash = stateToHashOrNull(state);
    if (hash === null) {
      history.replaceState(null, '', `${location.pathname}${location.search}`);
      this.host.messages.show(
        'warning',
        `This design is too large for a link (more than ${MAX_LINK_CHARS / 1024} kB), so the address no longer holds it; it is still autosaved here. Save a project file to share it.`,
        [],
        'link-size',
      );
      return;
    }
    this.host.messages.clear('link-size');
    if (always || location.hash !== hash) history.replaceState(null, '', hash);
  }
}

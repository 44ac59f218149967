/**
 * Picking a design on the map or in the design study: a clicked cell's (or a study design's) covering
 * fraction and rim depth become the current design; "Undo" brings back the designs it replaced, most
 * recent first.
 */
import { type CaseFile, validateCase } from '../../compute/caseFile';
import { applyDesign } from '../../compute/design/designVariables';
import type { DesignWheel } from '../../compute/design/types';
import type { PageHost } from '../pageHost';
import { axisOf, type PageResults } from './pageResults';

export interface MapPickHost extends PageHost {
  readonly results: PageResults | null;
}

export class MapPick {
  /** Designs replaced by picking a map cell, most recent last. */
  private readonly picked: CaseFile[] = [];

  constructor(private readonly host: MapPickHost) {}

  /** A map cell picked: its covering fraction and rim depth become the current design (Undo restores). */
  pick(i: number, j: number): void {
    const r = this.host.results;
    if (!r) return;
    const fraction = axisOf(r.studies.map, 'coverFraction')[i];
    const depthM = axisOf(r.studies.map, 'rimDepth')[j];
    if (fraction === undefined || depthM === undefined) return;
    this.choose(fraction, depthM, 'That map cell');
  }

  /**
   * A design chosen by its covering fraction and rim depth (a map cell, a study's row or front point;
   * a study's other freed variables in `values`, by variable id)
   * becomes the current design; `what` names it in a message. Undo restores the design it replaced.
   */
  choose(fraction: number, depthM: number, what: string, values: Record<string, number | string> = {}): void {
    const c = this.host.state.case;
    const placement = c.wheel.cover.placement === 'explicit' ? 'rim' : c.wheel.cover.placement;
    const wheel = { ...c.wheel, rim_depth_m: depthM, cover: { ...c.wheel.cover, fraction, placement } };
    // A study's other freed variables (tyre width, sides, placement, spokes), as the study set them.
    const next = validateCase({
      ...c,
      wheel: { ...wheel, ...applyDesign(wheel as unknown as DesignWheel, values) },
    });
    if (!next.ok) {
      this.host.messages.show('error', `${what} cannot be made the current design:`, next.errors, 'edit');
      return;
    }
    this.picked.push(c);
    this.showUndo();
    this.host.messages.clear('edit');
    this.host.apply({ ...this.host.state, case: next.value });
  }

  /** Every "Undo" button of picking (the map's and the design study's) shows while there is one to undo. */
  private showUndo(): void {
    for (const b of document.querySelectorAll<HTMLElement>('.undo-pick')) b.hidden = this.picked.length === 0;
  }

  undo(): void {
    const previous = this.picked.pop();
    this.showUndo();
    if (previous) this.host.apply({ ...this.host.state, case: previous });
  }
}

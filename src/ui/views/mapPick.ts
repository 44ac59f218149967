/**
 * Picking a design on the map: a clicked cell's covering fraction and rim depth become the current
 * design; "Undo map pick" brings back the designs it replaced, most recent first.
 */
import { type CaseFile, validateCase } from '../../compute/caseFile';
import type { PageHost } from '../pageHost';
import { axisOf, type PageResults } from './pageResults';
import { byId } from './present';

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
    const c = this.host.state.case;
    const placement = c.wheel.cover.placement === 'explicit' ? 'rim' : c.wheel.cover.placement;
    const next = validateCase({
      ...c,
      wheel: { ...c.wheel, rim_depth_m: depthM, cover: { ...c.wheel.cover, fraction, placement } },
    });
    if (!next.ok) {
      this.host.messages.show(
        'error',
        'That map cell cannot be made the current design:',
        next.errors,
        'edit',
      );
      return;
    }
    this.picked.push(c);
    byId('undo-pick').hidden = false;
    this.host.messages.clear('edit');
    this.host.apply({ ...this.host.state, case: next.value });
  }

  undo(): void {
    const previous = this.picked.pop();
    byId('undo-pick').hidden = this.picked.length === 0;
    if (previous) this.host.apply({ ...this.host.state, case: previous });
  }
}

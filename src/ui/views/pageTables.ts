/** The Tables tab: one DataTable per view of the results, each with CSV and JSON buttons (self-describing). */
import { DataTable } from '../dataTable';
import { tableExportButtons } from '../export/tableExportButtons';
import { renderCurrentTables } from './currentTables';
import { renderMapTable } from './mapTable';
import type { PageResults } from './pageResults';
import type { Present } from './present';
import { renderSweepTables } from './sweepTables';

export class PageTables {
  private readonly tables = new Map<string, DataTable>();

  /** `extra(id)`: lines a table adds to its file's header (e.g. the map's yaw and airspeed). */
  constructor(host: HTMLElement, extra: (id: string) => string[] = () => []) {
    const tables = this.tables;
    const specs: Array<[string, string]> = [
      ['table-current', 'Current design at each airspeed and yaw (drag and yaw plots, handling plot)'],
      ['table-components', 'Current design: axial drag by model component (first airspeed)'],
      ['table-family', 'Covering-fraction family vs yaw (drag and side-force plots)'],
      ['table-cover', 'Axial drag vs covered fraction (drag vs cover plot)'],
      ['table-map', 'Design map grid'],
      ['table-baseline', 'Current design against the pinned baseline'],
    ];
    for (const [id, caption] of specs) {
      const block = document.createElement('section');
      block.className = 'table-block';
      block.id = `${id}-block`;
      const head = document.createElement('div');
      head.className = 'table-head';
      const scroll = document.createElement('div');
      scroll.className = 'table-scroll';
      scroll.tabIndex = 0;
      scroll.setAttribute('role', 'region');
      scroll.setAttribute('aria-label', caption);
      const table = new DataTable(scroll, id, caption);
      head.append(
        ...tableExportButtons({
          title: () => table.caption(),
          suffix: id.replace('table-', ''),
          data: () => table.exportData(),
          extra: () => extra(id),
        }),
      );
      block.append(head, scroll);
      host.append(block);
      tables.set(id, table);
    }
  }

  render(ctx: Present, r: PageResults): void {
    renderCurrentTables(this.tables, ctx, r);
    renderSweepTables(this.tables, ctx, r);
    renderMapTable(this.tables, ctx, r);
  }

  /** The design map's grid only (the map landed; the other tables show what they showed). */
  renderMap(ctx: Present, r: PageResults): void {
    renderMapTable(this.tables, ctx, r);
  }
}

/** The Tables tab: one DataTable per view of the results, each with a CSV button. */
import { DataTable } from '../dataTable';
import { downloadText, safeFileStem } from '../download';
import { renderCurrentTables } from './currentTables';
import type { PageResults } from './pageResults';
import type { Present } from './present';
import { renderSweepTables } from './sweepTables';

export class PageTables {
  private readonly tables = new Map<string, DataTable>();

  /** `designName` names the CSV files (the design's name at the time of the click). */
  constructor(host: HTMLElement, designName: () => string | undefined) {
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
      const csv = document.createElement('button');
      csv.type = 'button';
      csv.textContent = 'CSV';
      csv.setAttribute('aria-label', `Save as CSV: ${caption}`);
      const scroll = document.createElement('div');
      scroll.className = 'table-scroll';
      scroll.tabIndex = 0;
      scroll.setAttribute('role', 'region');
      scroll.setAttribute('aria-label', caption);
      const table = new DataTable(scroll, id, caption);
      csv.addEventListener('click', () =>
        downloadText(
          `${safeFileStem(designName(), 'coversweep')}-${id.replace('table-', '')}.csv`,
          table.toCsv(),
          'text/csv',
        ),
      );
      head.append(csv);
      block.append(head, scroll);
      host.append(block);
      tables.set(id, table);
    }
  }

  render(ctx: Present, r: PageResults): void {
    renderCurrentTables(this.tables, ctx, r);
    renderSweepTables(this.tables, ctx, r);
  }
}

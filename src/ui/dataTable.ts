/**
 * A sortable data table: headers carry units, each header is a button that sorts by its column
 * (aria-sort says which), numbers are shown to a fixed number of decimals and exported to CSV at full
 * precision. All text goes in through textContent.
 */
import { toCsv } from './csv';
import { fixed } from './displayUnits';

export interface TableColumn {
  header: string;
  /** Decimals for numbers; strings are shown as they are. */
  decimals?: number;
}

export type Cell = number | string | null;

export class DataTable {
  readonly element: HTMLTableElement;
  private columns: TableColumn[] = [];
  private rows: Cell[][] = [];
  private sortColumn = -1;
  private sortAscending = true;

  constructor(
    container: HTMLElement,
    readonly id: string,
    caption: string,
  ) {
    this.element = document.createElement('table');
    this.element.id = id;
    this.element.className = 'data-table';
    const cap = document.createElement('caption');
    cap.textContent = caption;
    this.element.append(cap, document.createElement('thead'), document.createElement('tbody'));
    container.append(this.element);
  }

  setCaption(text: string): void {
    this.element.caption!.textContent = text;
  }

  setData(columns: TableColumn[], rows: Cell[][]): void {
    const sameColumns =
      columns.length === this.columns.length && columns.every((c, i) => c.header === this.columns[i]!.header);
    this.columns = columns;
    this.rows = rows;
    if (!sameColumns) this.sortColumn = -1;
    this.draw();
  }

  private sorted(): Cell[][] {
    if (this.sortColumn < 0) return this.rows;
    const k = this.sortColumn;
    const dir = this.sortAscending ? 1 : -1;
    return [...this.rows].sort((a, b) => {
      const x = a[k];
      const y = b[k];
      if (typeof x === 'number' && typeof y === 'number') {
        if (Number.isNaN(x)) return 1;
        if (Number.isNaN(y)) return -1;
        return (x - y) * dir;
      }
      return String(x ?? '').localeCompare(String(y ?? '')) * dir;
    });
  }

  private draw(): void {
    const thead = this.element.tHead!;
    const tbody = this.element.tBodies[0]!;
    const headRow = document.createElement('tr');
    this.columns.forEach((col, k) => {
      const th = document.createElement('th');
      th.scope = 'col';
      if (k === this.sortColumn)
        th.setAttribute('aria-sort', this.sortAscending ? 'ascending' : 'descending');
      const button = document.createElement('button');
      button.type = 'button';
      button.className = 'sort';
      button.textContent = col.header;
      button.title = `Sort by ${col.header}`;
      button.addEventListener('click', () => {
        if (this.sortColumn === k) this.sortAscending = !this.sortAscending;
        else {
          this.sortColumn = k;
          this.sortAscending = true;
        }
        this.draw();
        (this.element.tHead!.rows[0]!.cells[k]!.firstElementChild as HTMLElement | null)?.focus();
      });
      th.append(button);
      headRow.append(th);
    });
    thead.replaceChildren(headRow);
    const fragment = document.createDocumentFragment();
    for (const row of this.sorted()) {
      const tr = document.createElement('tr');
      row.forEach((cell, k) => {
        const td = document.createElement(k === 0 ? 'th' : 'td');
        if (k === 0) (td as HTMLTableCellElement).scope = 'row';
        const col = this.columns[k]!;
        td.textContent =
          typeof cell === 'number' ? fixed(cell, col.decimals ?? 3) : cell === null ? '—' : String(cell);
        if (typeof cell === 'number') td.className = 'num';
        tr.append(td);
      });
      fragment.append(tr);
    }
    tbody.replaceChildren(fragment);
  }

  /** The table as CSV (units in the header names), full precision, in the current sort order. */
  toCsv(): string {
    return toCsv(
      this.columns.map((c) => c.header),
      this.sorted().map((r) => r.map((c) => (typeof c === 'number' && !Number.isFinite(c) ? null : c))),
    );
  }
}

/**
 * A sortable data table: headers carry units, each header is a button that sorts by its column
 * (aria-sort says which), numbers are shown to a fixed number of decimals and exported to CSV at full
 * precision. All text goes in through textContent.
 *
 * Rows come from a source read on demand (a count and a cell getter), so a table of 300,000 rows costs
 * no per-row objects; at most PAGE_ROWS rows are in the document at a time, with a pager below the table
 * (first, previous, next, last page, and which rows are shown). Sorting orders an index of the rows.
 */
import { toCsv } from './csv';
import { fixed } from './displayUnits';

export interface TableColumn {
  header: string;
  /** Decimals for numbers; strings are shown as they are. */
  decimals?: number;
}

export type Cell = number | string | null;

/** Rows read on demand: `cell(row, column)` for row < count. */
export interface RowSource {
  count: number;
  cell(row: number, column: number): Cell;
}

/** Most rows in the document at once. */
export const PAGE_ROWS = 100;

export function rowsSource(rows: readonly Cell[][]): RowSource {
  return { count: rows.length, cell: (i, k) => rows[i]![k] ?? null };
}

export class DataTable {
  readonly element: HTMLTableElement;
  private readonly pager: HTMLElement;
  private columns: TableColumn[] = [];
  private source: RowSource = { count: 0, cell: () => null };
  private order: Uint32Array | null = null;
  private sortColumn = -1;
  private sortAscending = true;
  private page = 0;
  /** The columns and sort the header row shows. */
  private headKey = '';

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
    this.pager = document.createElement('div');
    this.pager.className = 'pager small';
    this.pager.id = `${id}-pager`;
    this.pager.hidden = true;
    container.append(this.element, this.pager);
  }

  setCaption(text: string): void {
    this.element.caption!.textContent = text;
  }

  setData(columns: TableColumn[], rows: Cell[][]): void {
    this.setRows(columns, rowsSource(rows));
  }

  /** Show `source`'s rows under `columns` (the first page; the sort is kept if the columns are). */
  setRows(columns: TableColumn[], source: RowSource): void {
    const sameColumns =
      columns.length === this.columns.length && columns.every((c, i) => c.header === this.columns[i]!.header);
    this.columns = columns;
    this.source = source;
    if (!sameColumns) this.sortColumn = -1;
    if (source.count <= this.page * PAGE_ROWS) this.page = 0;
    this.sortRows();
    this.draw();
  }

  get rowCount(): number {
    return this.source.count;
  }

  /** Row `i` in display order -> source row. */
  private rowAt(i: number): number {
    return this.order ? this.order[i]! : i;
  }

  private sortRows(): void {
    const n = this.source.count;
    if (this.sortColumn < 0) {
      this.order = null;
      return;
    }
    const k = this.sortColumn;
    const dir = this.sortAscending ? 1 : -1;
    const keys: Cell[] = new Array(n);
    for (let i = 0; i < n; i++) keys[i] = this.source.cell(i, k);
    const order = new Uint32Array(n);
    for (let i = 0; i < n; i++) order[i] = i;
    order.sort((a, b) => {
      const x = keys[a]!;
      const y = keys[b]!;
      if (typeof x === 'number' && typeof y === 'number') {
        if (Number.isNaN(x)) return Number.isNaN(y) ? a - b : 1;
        if (Number.isNaN(y)) return -1;
        return (x - y) * dir || a - b;
      }
      return String(x ?? '').localeCompare(String(y ?? '')) * dir || a - b;
    });
    this.order = order;
  }

  private draw(): void {
    this.drawHead();
    const tbody = this.element.tBodies[0]!;
    const n = this.source.count;
    const first = this.page * PAGE_ROWS;
    const last = Math.min(n, first + PAGE_ROWS);
    // The rows already in the table are kept and only their changed texts set (a table redrawn with new
    // numbers in the same shape, as each stage of the page's computing does, builds no new elements).
    const rows = tbody.rows;
    if (rows.length > 0 && rows[0]!.cells.length !== this.columns.length) tbody.replaceChildren();
    while (rows.length > last - first) rows[rows.length - 1]!.remove();
    const fragment = document.createDocumentFragment();
    for (let i = first; i < last; i++) {
      const r = this.rowAt(i);
      let tr: HTMLTableRowElement | undefined = rows[i - first];
      const fresh = !tr;
      if (!tr) tr = document.createElement('tr');
      this.columns.forEach((col, k) => {
        const cell = this.source.cell(r, k);
        let td = tr.cells[k];
        if (!td) {
          td = document.createElement(k === 0 ? 'th' : 'td');
          if (k === 0) (td as HTMLTableCellElement).scope = 'row';
          tr.append(td);
        }
        const text =
          typeof cell === 'number' ? fixed(cell, col.decimals ?? 3) : cell === null ? '—' : String(cell);
        if (td.textContent !== text) td.textContent = text;
        const className = typeof cell === 'number' ? 'num' : '';
        if (td.className !== className) td.className = className;
      });
      if (fresh) fragment.append(tr);
    }
    tbody.append(fragment);
    this.drawPager(first, last, n);
  }

  /** The header row: built again only when the columns or the sort changed. */
  private drawHead(): void {
    const thead = this.element.tHead!;
    const key = JSON.stringify([this.columns.map((c) => c.header), this.sortColumn, this.sortAscending]);
    if (key === this.headKey && thead.rows.length > 0) return;
    this.headKey = key;
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
        this.page = 0;
        this.sortRows();
        this.draw();
        (this.element.tHead!.rows[0]!.cells[k]!.firstElementChild as HTMLElement | null)?.focus();
      });
      th.append(button);
      headRow.append(th);
    });
    thead.replaceChildren(headRow);
  }

  private drawPager(first: number, last: number, n: number): void {
    this.pager.hidden = n <= PAGE_ROWS;
    if (this.pager.hidden) {
      this.pager.replaceChildren();
      return;
    }
    const pages = Math.ceil(n / PAGE_ROWS);
    const go = (label: string, page: number, disabled: boolean) => {
      const b = document.createElement('button');
      b.type = 'button';
      b.textContent = label;
      b.disabled = disabled;
      b.dataset.page = String(page);
      b.addEventListener('click', () => {
        this.page = page;
        this.draw();
      });
      return b;
    };
    const text = document.createElement('span');
    text.setAttribute('role', 'status');
    text.textContent = `Rows ${(first + 1).toLocaleString('en')}–${last.toLocaleString('en')} of ${n.toLocaleString('en')} (page ${this.page + 1} of ${pages}); the CSV export has every row.`;
    this.pager.replaceChildren(
      go('First', 0, this.page === 0),
      go('Previous', this.page - 1, this.page === 0),
      text,
      go('Next', this.page + 1, this.page >= pages - 1),
      go('Last', pages - 1, this.page >= pages - 1),
    );
  }

  /** The table's caption (what it shows). */
  caption(): string {
    return this.element.caption?.textContent ?? this.id;
  }

  /** Headers (units in the names) and every row at full precision, in the current sort order. */
  exportData(): { headers: string[]; rows: Cell[][] } {
    const rows: Cell[][] = [];
    for (let i = 0; i < this.source.count; i++) {
      const r = this.rowAt(i);
      rows.push(
        this.columns.map((_, k) => {
          const c = this.source.cell(r, k);
          return typeof c === 'number' && !Number.isFinite(c) ? null : c;
        }),
      );
    }
    return { headers: this.columns.map((c) => c.header), rows };
  }

  /** The table as CSV (units in the header names), full precision, in the current sort order. */
  toCsv(): string {
    const { headers, rows } = this.exportData();
    return toCsv(headers, rows);
  }
}

import type { Cell } from '../dataTable';

/** A table export's rows must each have one cell per header (RangeError naming the writer otherwise). */
export function checkTableRows(
  writer: string,
  headers: readonly string[],
  rows: ReadonlyArray<ReadonlyArray<Cell>>,
): void {
  if (rows.some((r) => r.length !== headers.length)) {
    throw new RangeError(`${writer}: every row must have ${headers.length} cells, one per header`);
  }
}

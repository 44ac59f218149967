/**
 * The named-axis result cube: a strided view (shape, strides, offset; the layout of scijs ndarray) over
 * the packed Float64Array of a study, with axes such as cover fraction x rim depth x airspeed x yaw and
 * a last axis of result columns (columns.ts). Picking an axis, a column or a point makes a new view of
 * the same buffer; nothing is copied until values() or points() is asked for.
 *
 * Why not scijs ndarray itself: it compiles its view classes with `new Function`, which the page's
 * Content-Security-Policy (script-src 'self', no 'unsafe-eval') forbids; the layout here is the same.
 */
import type { PointResult } from '../../model/wheel';
import { COLUMN_COUNT, COLUMN_NAMES, columnIndex } from '../engine/columns';
import { unpackPoints } from '../engine/packPoints';
import type { StudyAxis } from './studyPlan';

/** Axis name -> index along that axis. */
export type AxisPick = Readonly<Record<string, number>>;

export class ResultCube {
  private constructor(
    /** The axes not yet picked, outermost first (the column axis is not among them). */
    readonly axes: readonly StudyAxis[],
    /** The packed buffer, shared by every view of the study. */
    readonly data: Float64Array,
    private readonly strides: readonly number[],
    private readonly offset: number,
    /** Column positions within a packed row that this view keeps. */
    private readonly columnIndices: readonly number[],
  ) {}

  /** A cube over `data`: the axes' cells row-major (last fastest), each a packed row of every column. */
  static fromPacked(axes: readonly StudyAxis[], data: Float64Array): ResultCube {
    let size = COLUMN_COUNT;
    const strides = new Array<number>(axes.length);
    for (let i = axes.length - 1; i >= 0; i--) {
      strides[i] = size;
      size *= axes[i]!.values.length;
    }
    if (data.length !== size) {
      throw new RangeError(
        `cube data: ${data.length} values do not fill ${axes.map((a) => `${a.name} ${a.values.length}`).join(' x ')} x ${COLUMN_COUNT} columns = ${size}`,
      );
    }
    return new ResultCube(
      axes,
      data,
      strides,
      0,
      COLUMN_NAMES.map((_, i) => i),
    );
  }

  /** Lengths of the remaining axes, then the number of columns kept. */
  get shape(): number[] {
    return [...this.axes.map((a) => a.values.length), this.columnIndices.length];
  }

  get columns(): string[] {
    return this.columnIndices.map((i) => COLUMN_NAMES[i]!);
  }

  /** Cells of the remaining axes (1 when every axis is picked). */
  get size(): number {
    let n = 1;
    for (const a of this.axes) n *= a.values.length;
    return n;
  }

  axis(name: string): StudyAxis {
    const a = this.axes.find((x) => x.name === name);
    if (!a) throw new RangeError(`axis "${name}" is not an axis of this cube (axes: ${this.axisNames()})`);
    return a;
  }

  has(name: string): boolean {
    return this.axes.some((a) => a.name === name);
  }

  private axisNames(): string {
    return this.axes.map((a) => a.name).join(', ') || 'none left';
  }

  /** Fix some axes at an index each; the view keeps the others. */
  pick(at: AxisPick): ResultCube {
    let offset = this.offset;
    const axes: StudyAxis[] = [];
    const strides: number[] = [];
    const left = new Set(Object.keys(at));
    this.axes.forEach((a, i) => {
      const k = at[a.name];
      if (k === undefined) {
        axes.push(a);
        strides.push(this.strides[i]!);
        return;
      }
      if (!(Number.isInteger(k) && k >= 0 && k < a.values.length)) {
        throw new RangeError(
          `${a.name}: index must be an integer from 0 to ${a.values.length - 1}, got ${k}`,
        );
      }
      offset += k * this.strides[i]!;
      left.delete(a.name);
    });
    if (left.size > 0) {
      throw new RangeError(`axis "${[...left][0]}" is not an axis of this cube (axes: ${this.axisNames()})`);
    }
    return new ResultCube(axes, this.data, strides, offset, this.columnIndices);
  }

  /** Keep one column (a result quantity, by its name in columns.ts). */
  column(name: string): ResultCube {
    const i = columnIndex(name);
    if (!this.columnIndices.includes(i)) throw new RangeError(`column "${name}" was not kept in this view`);
    return new ResultCube(this.axes, this.data, this.strides, this.offset, [i]);
  }

  /** Index of the axis value nearest `value` (numeric axes). */
  nearest(name: string, value: number): number {
    const values = this.axis(name).values;
    let best = 0;
    for (let i = 1; i < values.length; i++) {
      if (Math.abs((values[i] as number) - value) < Math.abs((values[best] as number) - value)) best = i;
    }
    return best;
  }

  /** The single value of a view with every axis picked and one column kept. */
  value(): number {
    if (this.axes.length > 0 || this.columnIndices.length !== 1) {
      throw new RangeError(
        `value(): pick every axis and one column first (axes left: ${this.axisNames()}; columns ${this.columnIndices.length})`,
      );
    }
    return this.data[this.offset + this.columnIndices[0]!]!;
  }

  /** One column's values over the remaining axes, row-major (a copy: the one place values leave the buffer). */
  values(): Float64Array {
    if (this.columnIndices.length !== 1)
      throw new RangeError('values(): keep one column first (column(name))');
    const c = this.columnIndices[0]!;
    const out = new Float64Array(this.size);
    this.forEachCell((o, k) => {
      out[k] = this.data[o + c]!;
    });
    return out;
  }

  /** The packed row of a view with every axis picked (a subarray of the buffer, not a copy). */
  row(): Float64Array {
    if (this.axes.length > 0)
      throw new RangeError(`row(): pick every axis first (left: ${this.axisNames()})`);
    return this.data.subarray(this.offset, this.offset + COLUMN_COUNT);
  }

  /** The remaining cells as model points, row-major (for views that show every quantity of a point). */
  points(): PointResult[] {
    const out: PointResult[] = [];
    this.forEachCell((o) => {
      out.push(unpackPoints(this.data.subarray(o, o + COLUMN_COUNT), 1)[0]!);
    });
    return out;
  }

  /** Visit the start of every remaining cell's packed row, row-major, with its running index. */
  private forEachCell(visit: (offset: number, k: number) => void): void {
    const n = this.axes.length;
    const lengths = this.axes.map((a) => a.values.length);
    const size = this.size;
    const index = new Array<number>(n).fill(0);
    let o = this.offset;
    for (let k = 0; k < size; k++) {
      visit(o, k);
      for (let d = n - 1; d >= 0; d--) {
        index[d]!++;
        o += this.strides[d]!;
        if (index[d]! < lengths[d]!) break;
        o -= index[d]! * this.strides[d]!;
        index[d] = 0;
      }
    }
  }
}

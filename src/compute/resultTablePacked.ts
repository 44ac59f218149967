/**
 * The result table's lines of one solved case written straight from its packed rows (a worker's
 * Float64Array, columns.ts), with no PointResult or ResultDocument objects in between: the same text as
 * documentCsvLines(solutionToDocument(caseFile, { surface, points: unpackPoints(packed) }), ...), field
 * for field (the same derived quantities through the same functions, numbers through the same
 * ECMA-262 Number::toString), at a fraction of the cost: a sweep's command line writes ~10^6 fields.
 */
import { pointYawDeg } from './case/resultDocument';
import { type CaseFile, COMPONENT_KEYS, COMPONENT_NAMES, RESULT_SCALAR_KEYS } from './caseFile';
import { COLUMN_COUNT, columnIndex } from './engine/columns';
import { FLAG_CODES } from './engine/packPoints';
import type { PlanValue } from './planFile';
import { csvField } from './resultTable';
import { dragAreaToGramsForce, kmhToMps, mphToMps } from './units';

/** Where each CSV result column (but yaw_deg and the derived ones) reads its number in a packed row. */
interface PackedLayout {
  /** Packed column of each RESULT_SCALAR_KEYS entry that is a packed number as it is, else -1. */
  scalar: Int32Array;
  /** Packed columns of each component's fxN, fyN, fzN and axleTorqueNm, component by component. */
  component: Int32Array;
  cda: number;
  rho: number;
  yawRad: number;
  gciAxial: number;
  gciSide: number;
  flagBits: number;
}

/** The CSV's result keys whose value is computed here, not read from one packed column. */
const DERIVED = new Set<string>(['yaw_deg', 'cda_axial_cm2', 'axial_gf_ref', 'axial_gf_30mph']);
/** COMPONENT_KEYS in the packed row's field names (the CSV's axial_N is -fxN). */
const COMPONENT_FIELD_OF: Record<(typeof COMPONENT_KEYS)[number], string> = {
  axial_N: 'fxN',
  side_N: 'fyN',
  vertical_N: 'fzN',
  axle_torque_Nm: 'axleTorqueNm',
};

let layout: PackedLayout | null = null;

function packedLayout(): PackedLayout {
  if (layout) return layout;
  // The row loop writes each component's four fields in this order, the first negated.
  if (COMPONENT_KEYS.join() !== 'axial_N,side_N,vertical_N,axle_torque_Nm') {
    throw new Error(`packedCsvLines: COMPONENT_KEYS changed (${COMPONENT_KEYS.join()}); update the row loop`);
  }
  const scalar = Int32Array.from(RESULT_SCALAR_KEYS, (k) => (DERIVED.has(k) ? -1 : columnIndex(k)));
  const component = new Int32Array(COMPONENT_NAMES.length * COMPONENT_KEYS.length);
  let o = 0;
  for (const c of COMPONENT_NAMES)
    for (const k of COMPONENT_KEYS) component[o++] = columnIndex(`${c}.${COMPONENT_FIELD_OF[k]}`);
  layout = {
    scalar,
    component,
    cda: columnIndex('cdaAxialM2'),
    rho: columnIndex('rhoKgPerM3'),
    yawRad: columnIndex('yawRad'),
    gciAxial: columnIndex('uncertaintyAxialN'),
    gciSide: columnIndex('uncertaintySideN'),
    flagBits: columnIndex('flagBits'),
  };
  return layout;
}

/**
 * The lines are assembled as bytes in one reused buffer and decoded once per case: appending ~50
 * short strings per row to a string made ropes whose flattening and garbage cost more than the
 * number-to-text conversion itself. Every byte written is a code unit below 0x80 (digits, signs,
 * '.', 'e', ',', flag codes), but the varied prefix, which is copied in as UTF-8.
 */
let bytes = new Uint8Array(1 << 16);

function ensureBytes(size: number): void {
  if (bytes.length < size) bytes = new Uint8Array(Math.max(size, 2 * bytes.length));
}

/**
 * A case's numbers, row after row, turned into text by one JSON.stringify: JSON writes a finite number
 * as ECMA-262 Number::toString, the same text as csvField (ECMA-262, SerializeJSONProperty: "If value
 * is finite, return ! ToString(value)"; -0 gives "0" in both), straight into its output, where a
 * template string per number made a string per number (about 0.7 million of them in a standard
 * sweep) and their garbage. A non-finite number comes out as "null" and is dropped (csvField's empty
 * field). `values` stays an array of doubles, reused; `text` holds the JSON's ASCII bytes.
 */
const values: number[] = [];
let text = new Uint8Array(1 << 16);
const encoder = new TextEncoder();

const COMMA = 44;
const NEWLINE = 10;
const CLOSE_BRACKET = 93;
/** 'n', the first letter of "null", the one letter of the JSON of a number array that is no number's. */
const LETTER_N = 110;

/** Write an ASCII string at `at`. */
function putAscii(ascii: string, at: number): number {
  for (let k = 0; k < ascii.length; k++) bytes[at++] = ascii.charCodeAt(k);
  return at;
}

/**
 * Copy the next `fields` numbers of the JSON text from `from` (each with its comma, a "null" as an
 * empty field) to `at` in the output. Returns where the copy ended in the output; `cursor.next` is
 * where the next row's numbers start in the text.
 */
function copyFields(from: number, fields: number, at: number, cursor: { next: number }): number {
  let k = from;
  for (let seen = 0; seen < fields; k++) {
    const c = text[k]!;
    if (c === COMMA || c === CLOSE_BRACKET) {
      bytes[at++] = COMMA;
      seen++;
    } else if (c === LETTER_N) {
      k += 3;
    } else {
      bytes[at++] = c;
    }
  }
  cursor.next = k;
  return at;
}

/** The flags cell of each flag bit set, as the document's flags joined with ';' (csvField applied). */
const flagCells = new Map<number, string>();
const decoder = new TextDecoder();

function flagCell(bits: number): string {
  let cell = flagCells.get(bits);
  if (cell === undefined) {
    cell = csvField(FLAG_CODES.filter((_, bit) => (bits & (1 << bit)) !== 0).join(';'));
    if (!/^[\x20-\x7e]*$/.test(cell)) throw new Error(`packedCsvLines: flag codes must be ASCII: ${cell}`);
    flagCells.set(bits, cell);
  }
  return cell;
}

/**
 * The CSV lines (no header) of a solved case of `caseFile` whose `pointCount` points are packed row by
 * row in `packed`: one per point, its varied parameters first, then the result columns (resultTable.ts).
 */
export function packedCsvLines(...args: Parameters<typeof packedCsvBytes>): string {
  return decoder.decode(packedCsvBytes(...args));
}

/** packedCsvLines's text as UTF-8 bytes (a copy of its own): for a file, with no string in between. */
export function packedCsvBytes(
  packed: Float64Array,
  pointCount: number,
  caseFile: CaseFile,
  variedKeys: readonly string[],
  varied: Readonly<Record<string, PlanValue>>,
): Uint8Array {
  if (packed.length !== pointCount * COLUMN_COUNT) {
    throw new RangeError(`packedCsvLines: ${packed.length} values are not ${pointCount} packed rows`);
  }
  const { scalar, component, cda, rho, yawRad, gciAxial, gciSide, flagBits } = packedLayout();
  const referenceSpeedMps = kmhToMps(caseFile.conditions.reference_speed_kmh);
  const speed30MphMps = mphToMps(30);
  let prefix = '';
  for (const k of variedKeys) prefix += `${csvField(varied[k] ?? null)},`;
  const prefixBytes = new TextEncoder().encode(prefix);
  const scalarCount = scalar.length;
  const componentCount = component.length;
  // At most 24 characters and a comma per number ("-2.2250738585072014e-308"), the flags cell (ASCII
  // codes, or quoted ones) and a newline per row.
  const fieldCount = scalarCount + componentCount + 2;
  const flagsMax = 2 * FLAG_CODES.join(';').length + 4;
  ensureBytes(pointCount * (prefixBytes.length + 25 * fieldCount + flagsMax + 2));
  const speeds = [referenceSpeedMps, speed30MphMps];
  // The numbers of every row, in the columns' order.
  let v = 0;
  for (let i = 0, row = 0; i < pointCount; i++, row += COLUMN_COUNT) {
    for (let s = 0; s < scalarCount; s++) {
      const column = scalar[s]!;
      if (column >= 0) {
        values[v++] = packed[row + column]!;
        continue;
      }
      const key = RESULT_SCALAR_KEYS[s];
      const cdaM2 = packed[row + cda]!;
      values[v++] =
        key === 'yaw_deg'
          ? pointYawDeg(caseFile, pointCount, i, packed[row + yawRad]!)
          : key === 'cda_axial_cm2'
            ? cdaM2 * 1e4
            : dragAreaToGramsForce(cdaM2, speeds[key === 'axial_gf_ref' ? 0 : 1]!, packed[row + rho]!);
    }
    for (let c = 0; c < componentCount; c += 4) {
      values[v++] = -packed[row + component[c]!]!;
      values[v++] = packed[row + component[c + 1]!]!;
      values[v++] = packed[row + component[c + 2]!]!;
      values[v++] = packed[row + component[c + 3]!]!;
    }
    values[v++] = packed[row + gciAxial]!;
    values[v++] = packed[row + gciSide]!;
  }
  values.length = v;
  const json = JSON.stringify(values);
  if (text.length < json.length) text = new Uint8Array(Math.max(json.length, 2 * text.length));
  encoder.encodeInto(json, text);
  const cursor = { next: 1 };
  let at = 0;
  for (let i = 0, row = 0; i < pointCount; i++, row += COLUMN_COUNT) {
    bytes.set(prefixBytes, at);
    at += prefixBytes.length;
    at = copyFields(cursor.next, fieldCount, at, cursor);
    at = putAscii(flagCell(packed[row + flagBits]!), at);
    bytes[at++] = COMMA;
    bytes[at++] = NEWLINE;
  }
  return bytes.slice(0, at);
}

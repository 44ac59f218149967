/**
 * Guess a map file from a data file's header (and a look at its values), for the user to confirm.
 * Every guess carries a plain note saying what was assumed and why; nothing guessed is used silently.
 */
import { type CsvTable, parseNumberCell } from './csv';
import { MAP_FORMAT, MAP_VERSION, type MapColumn, type MapFile, mapRules } from './mapFile';
import {
  COEFFICIENT_QUANTITIES,
  QUANTITY_OUTPUT,
  QUANTITY_UNITS,
  type Quantity,
  type Unit,
} from './quantities';

export interface MapGuess {
  map: MapFile;
  /** One note per column and per assumption, to show for confirmation. */
  notes: string[];
  /** Problems left for the user to settle (the guessed map breaks these rules). */
  problems: string[];
}

export interface GuessContext {
  /** Reference area to assume for coefficients (m^2), normally the wheel's disc pi R^2. */
  referenceAreaM2: number;
  /** Airspeed to assume when no column holds one (m/s), e.g. the case's first airspeed. */
  airspeedMps?: number;
}

const UNIT_WORDS: [RegExp, Unit][] = [
  [/^(kg\/m\^?3|kg\/m³|kgpm3|kg m-3)$/, 'kgpm3'],
  [/^(n\.?mm|n mm|nmm)$/, 'Nmm'],
  [/^(n\.?m|n m|nm)$/, 'Nm'],
  [/^(cm\^?2|cm²|sq ?cm)$/, 'cm2'],
  [/^(m\^?2|m²|sq ?m)$/, 'm2'],
  [/^(km\/h|kmh|kph|km h-1)$/, 'kmh'],
  [/^mph$/, 'mph'],
  [/^(m\/s|mps|m s-1|ms-1)$/, 'mps'],
  [/^(deg|degs|degrees|°)$/, 'deg'],
  [/^(rad|radians)$/, 'rad'],
  [/^(kgf|kg|kp)$/, 'kgf'],
  [/^(lbf|lb|lbs)$/, 'lbf'],
  [/^(gf|g|gram|grams|gr)$/, 'gf'],
  [/^(n|newton|newtons)$/, 'N'],
  [/^(-|1|—|none)$/, '1'],
];

function unitFromText(text: string): Unit | null {
  const t = text.trim().toLowerCase();
  for (const [re, unit] of UNIT_WORDS) if (re.test(t)) return unit;
  return null;
}

/** Split "Drag [g]", "drag (N)", "drag_N", "Fx in lbf" into a name and a unit. */
export function splitHeader(header: string): { name: string; unit: Unit | null } {
  const bracket = header.match(/^(.*?)[[(]([^\])]*)[\])]\s*$/);
  if (bracket) return { name: bracket[1]!.trim(), unit: unitFromText(bracket[2]!) };
  const inWord = header.match(/^(.*?)\s+in\s+(\S+)\s*$/i);
  if (inWord) {
    const u = unitFromText(inWord[2]!);
    if (u) return { name: inWord[1]!.trim(), unit: u };
  }
  const sep = header.match(/^(.*?)[_\s/]+([^_\s]+)$/);
  if (sep) {
    const u = unitFromText(sep[2]!);
    if (u) return { name: sep[1]!.trim(), unit: u };
  }
  return { name: header.trim(), unit: null };
}

function quantityFromName(name: string): Quantity | null {
  const n = name.toLowerCase().replace(/[_-]+/g, ' ');
  const wind = /wind ?axis|wind drag|wind_drag|\bwind\b/.test(n) && !/wind ?speed/.test(n);
  if (/steer/.test(n)) return 'steering_moment';
  if (/moment|torque|\bmz\b|\bn ?m\b/.test(n)) return 'yaw_moment';
  if (/\byaw\b|\bbeta\b|\bangle\b|\bpsi\b/.test(n)) return 'yaw_deg';
  if (/density|\brho\b/.test(n)) return 'air_density';
  if (/speed|velocity|\bv\b|\bu\b|\bu ?inf\b|\bv ?inf\b/.test(n)) return 'speed';
  if (/\bcda\b|drag ?area|\bcd ?\* ?a\b|\bcd ?a\b/.test(n)) return wind ? 'drag_area_wind' : 'drag_area';
  if (/\bcd\b|\bcx\b|drag ?coef/.test(n)) return wind ? 'drag_coefficient_wind' : 'drag_coefficient';
  if (/\bc[sy]\b|side ?(force )?coef/.test(n)) return 'side_coefficient';
  if (/side|lateral|\bfy\b|\bfs\b|\by\b/.test(n)) return 'side_force';
  if (/drag|axial|\bfx\b|\bfd\b|resist|\bd\b/.test(n)) return wind ? 'drag_force_wind' : 'axial_force';
  return null;
}

function medianAbs(table: CsvTable | undefined, column: number): number {
  if (!table) return Number.NaN;
  const v: number[] = [];
  for (const row of table.rows) {
    const x = parseNumberCell(row[column] ?? '', table.decimalComma);
    if (x !== null && Number.isFinite(x)) v.push(Math.abs(x));
    if (v.length >= 200) break;
  }
  if (v.length === 0) return Number.NaN;
  v.sort((a, b) => a - b);
  return v[Math.floor(v.length / 2)]!;
}

/** Guess the mapping of every header; columns that cannot be recognised are mapped to "ignore". */
export function guessMap(
  headers: readonly string[],
  table: CsvTable | undefined,
  context: GuessContext,
): MapGuess {
  const columns: Record<string, MapColumn> = {};
  const notes: string[] = [];
  for (const [k, header] of headers.entries()) {
    const { name, unit } = splitHeader(header);
    const quantity = quantityFromName(name);
    if (!quantity) {
      columns[header] = { quantity: 'ignore', unit: unit ?? '1' };
      notes.push(`"${header}": not recognised, ignored (map it by hand if it matters)`);
      continue;
    }
    const allowed = QUANTITY_UNITS[quantity];
    let chosen: Unit;
    const med = medianAbs(table, k);
    if (unit && allowed.includes(unit)) {
      chosen = unit;
      notes.push(`"${header}": ${quantity} in ${unit} (from the header)`);
    } else {
      // No usable unit in the header: decide from the quantity and the size of the values.
      if (quantity === 'yaw_deg') chosen = Number.isFinite(med) && med < 0.6 && med > 0 ? 'rad' : 'deg';
      else if (quantity === 'speed') chosen = Number.isFinite(med) && med > 20 ? 'kmh' : 'mps';
      else if (quantity === 'drag_area' || quantity === 'drag_area_wind') chosen = med > 2 ? 'cm2' : 'm2';
      else if (allowed.includes('N')) chosen = med > 60 ? 'gf' : 'N';
      else chosen = allowed[0]!;
      const why = Number.isFinite(med) ? ` (typical value ${med.toPrecision(3)})` : '';
      notes.push(
        `"${header}": ${quantity}; ${unit ? `unit "${unit}" does not fit it` : 'no unit in the header'}, assumed ${chosen}${why}: CHECK`,
      );
    }
    const col: MapColumn = { quantity, unit: chosen };
    if (COEFFICIENT_QUANTITIES.includes(quantity)) {
      col.reference_area_m2 = context.referenceAreaM2;
      notes.push(
        `"${header}": coefficient assumed to be based on the wheel's disc area ${context.referenceAreaM2.toPrecision(4)} m^2: CHECK`,
      );
    }
    columns[header] = col;
  }
  const map: MapFile = { format: MAP_FORMAT, version: MAP_VERSION, columns, side_force_sign: 1 };
  notes.push(
    "side_force_sign 1 assumed: positive side force pushes the wheel to the rider's left when the wind comes from the right (yaw > 0): CHECK",
  );
  const hasSpeed = Object.values(columns).some((c) => c.quantity === 'speed');
  if (!hasSpeed && context.airspeedMps !== undefined) {
    map.airspeed_mps = context.airspeedMps;
    notes.push(`no speed column: airspeed ${context.airspeedMps} m/s assumed (from the case): CHECK`);
  }
  notes.push("no air density given: the case's air density will be used (set air_density_kgpm3 to override)");
  // Two columns guessed to the same output (or two yaw/speed columns): keep the first, ignore the rest.
  const taken = new Map<string, string>();
  for (const [header, col] of Object.entries(columns)) {
    if (col.quantity === 'ignore') continue;
    const key = QUANTITY_OUTPUT[col.quantity] ?? col.quantity;
    const first = taken.get(key);
    if (first !== undefined) {
      columns[header] = { quantity: 'ignore', unit: col.unit };
      notes.push(`"${header}": looks like the same quantity as "${first}", ignored: CHECK`);
    } else {
      taken.set(key, header);
    }
  }
  const problems = mapRules(map);
  return { map, notes, problems };
}

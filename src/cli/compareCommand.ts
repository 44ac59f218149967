/**
 * `coversweep compare CASE.json DATA.csv --map MAP.json [--calibrate] ...`: hold a data file of measured
 * or simulated results against the model. Prints JSON (format "coversweep-compare") with the converted
 * data, `flags` (code + plain message), `residuals`, and on request the calibration, a convergence study
 * and an input-uncertainty band. Without --map it prints the guessed map for confirmation and stops.
 * Exit codes: 0 success, 1 internal error, 2 invalid input or usage (messages on stderr, nothing on stdout).
 */
import { resolve } from 'node:path';
import { parseCaseFile } from '../compute/caseFile';
import {
  CALIBRATABLE,
  type Calibratable,
  calibratedCase,
  checkDataSize,
  guessMap,
  MAX_DATA_BYTES,
  parseCsvText,
  parseMapFile,
  runComparison,
  UNCERTAIN_INPUTS,
  type UncertainInput,
  type UncertainRange,
} from '../compute/compare/index';
import { modelAtDataHere } from '../compute/study/dataComparisonStudy';
import { formatCompareTable } from './formatCompare';
import { outputFormat } from './formatTable';
import { CliInputError } from './io';
import { AtomicFile, checkOutputPath } from './outputFile';
import { OptionError, parseOptions } from './parseOptions';

export interface CompareIo {
  stdout(s: string): void;
  stderr(s: string): void;
  /** The file's text; `maxBytes` is the limit for this kind of file. */
  readFile(p: string, maxBytes: number): string;
  fileSize(p: string): number;
  /** Folder that relative output paths (--write-case) are resolved against (default: the process's). */
  cwd?: string;
}

export const COMPARE_HELP = `Usage: coversweep compare CASE.json DATA.csv [--map MAP.json] [options]

Hold a table of measured or simulated results (CSV, or a tab-separated table pasted from a
spreadsheet) against the model for the wheel and conditions of CASE.json. Prints JSON (format
"coversweep-compare"): the data converted to SI and the tool's axes, flags for likely slips (units,
axes, reference area, side-force sign, zero-yaw offset, yaw symmetry, speed scaling), and residuals
data - model with the model's band. DATA.csv is never modified (at most ${MAX_DATA_BYTES / (1024 * 1024)} MB).

Without --map, the column mapping guessed from the header is printed (a map file) for you to check,
save and pass with --map; nothing is compared.

Map file (JSON): {"format": "coversweep-map", "version": 1,
  "columns": {"<header>": {"quantity": Q, "unit": U, "reference_area_m2": A}},
  "side_force_sign": 1 | -1, "yaw_moment_sign": 1 | -1, "airspeed_mps": V, "air_density_kgpm3": RHO}
  Q: yaw_deg (deg|rad), speed (mps|kmh|mph), air_density (kgpm3), axial_force, drag_force_wind,
     side_force (N|gf|kgf|lbf), drag_area, drag_area_wind (m2|cm2), drag_coefficient,
     drag_coefficient_wind, side_coefficient ("1", with reference_area_m2), yaw_moment,
     steering_moment (Nm|Nmm), ignore.

Options:
  --map FILE              the column mapping (see above)
  --calibrate             fit model parameters to the data; report values, 95% intervals, residuals
  --parameters LIST       parameters to fit, comma-separated (default: ${CALIBRATABLE.join(',')})
  --convergence           add a lattice convergence study (three refinements, GCI per output)
  --uncertainty SPEC      add a Monte Carlo band; SPEC = name=min:max[,name=min:max...] with names
                          ${UNCERTAIN_INPUTS.join(', ')}
  --write-case FILE       with --calibrate: write the calibrated case file (the case with the fitted
                          parameters in its "model" section, named CALIBRATED); \`coversweep solve\` of
                          it draws the fitted curve. Written atomically; never over an existing file
                          without --force
  --force                 allow --write-case to replace an existing file
  --format json|table     json (default): the report document on stdout; table: a readable summary
  --samples N             Monte Carlo draws (default 64)
  --seed N                Monte Carlo seed (default 1)
  --help                  show this help
`;

class UsageError extends Error {
  constructor(readonly messages: string[]) {
    super(messages[0]);
  }
}

function readText(io: CompareIo, path: string, what: string, maxBytes: number): string {
  let size: number;
  try {
    size = io.fileSize(path);
  } catch (error) {
    throw new UsageError([
      `${what} ${path}: cannot be read (${error instanceof Error ? error.message : String(error)})`,
    ]);
  }
  const tooBig = checkDataSize(size, maxBytes);
  if (tooBig) throw new UsageError([`${what} ${path}: ${tooBig}`]);
  try {
    return io.readFile(path, maxBytes);
  } catch (error) {
    throw new UsageError([
      `${what} ${path}: cannot be read (${error instanceof Error ? error.message : String(error)})`,
    ]);
  }
}

function parseUncertainty(spec: string): UncertainRange[] {
  const ranges: UncertainRange[] = [];
  for (const part of spec
    .split(',')
    .map((s) => s.trim())
    .filter((s) => s !== '')) {
    const m = part.match(/^([a-z0-9_]+)=([^:]+):(.+)$/);
    if (!m) throw new UsageError([`--uncertainty: "${part}" must look like name=min:max`]);
    const name = m[1]! as UncertainInput;
    if (!UNCERTAIN_INPUTS.includes(name)) {
      throw new UsageError([`--uncertainty: "${m[1]}" is not one of ${UNCERTAIN_INPUTS.join(', ')}`]);
    }
    const min = Number(m[2]);
    const max = Number(m[3]);
    if (!Number.isFinite(min) || !Number.isFinite(max) || min > max) {
      throw new UsageError([
        `--uncertainty: ${name} range "${m[2]}:${m[3]}" must be two numbers with min <= max`,
      ]);
    }
    ranges.push({ name, min, max });
  }
  if (ranges.length === 0) throw new UsageError(['--uncertainty: give at least one name=min:max']);
  return ranges;
}

function integerOption(
  text: string | undefined,
  name: string,
  min: number,
  max: number,
  fallback: number,
): number {
  if (text === undefined) return fallback;
  const v = Number(text);
  if (!Number.isInteger(v) || v < min || v > max) {
    throw new UsageError([`--${name}: must be an integer between ${min} and ${max}, got "${text}"`]);
  }
  return v;
}

export function runCompare(argv: string[], io: CompareIo): number {
  const args = argv[0] === 'compare' ? argv.slice(1) : argv;
  try {
    const { values, positionals } = parseOptions('compare', {
      args,
      allowPositionals: true,
      options: {
        map: { type: 'string' },
        calibrate: { type: 'boolean' },
        parameters: { type: 'string' },
        convergence: { type: 'boolean' },
        uncertainty: { type: 'string' },
        samples: { type: 'string' },
        seed: { type: 'string' },
        'write-case': { type: 'string' },
        force: { type: 'boolean' },
        format: { type: 'string' },
        help: { type: 'boolean', short: 'h' },
      },
    });
    if (values.help) {
      io.stdout(COMPARE_HELP);
      return 0;
    }
    if (positionals.length !== 2) {
      throw new UsageError([
        `compare needs exactly two files, CASE.json and DATA.csv, got ${positionals.length}${positionals.length ? ` (${positionals.join(' ')})` : ''}`,
        'run "coversweep compare --help" for the usage',
      ]);
    }
    const [casePath, dataPath] = positionals as [string, string];
    const format = outputFormat(values.format);
    const writeCase = values['write-case'];
    let writePath: string | undefined;
    if (writeCase !== undefined) {
      if (!values.calibrate) throw new UsageError(['--write-case: only used with --calibrate']);
      if (values.map === undefined) throw new UsageError(['--write-case: needs --map (and --calibrate)']);
      writePath = resolve(io.cwd ?? process.cwd(), writeCase);
      checkOutputPath(writePath, values.force === true, '--write-case');
    } else if (values.force) {
      throw new UsageError(['--force: only used with --write-case']);
    }
    const parsedCase = parseCaseFile(readText(io, casePath, 'case file', 4 * 1024 * 1024));
    if (!parsedCase.ok) throw new UsageError(parsedCase.errors.map((e) => `${casePath}: ${e}`));
    const caseFile = parsedCase.value;
    const table = parseCsvText(readText(io, dataPath, 'data file', MAX_DATA_BYTES));
    if (!table.ok) throw new UsageError(table.errors.map((e) => `${dataPath}: ${e}`));

    if (values.map === undefined) {
      const R = caseFile.wheel.outer_radius_m;
      const guess = guessMap(table.value.headers, table.value, {
        referenceAreaM2: Math.PI * R * R,
        airspeedMps: caseFile.conditions.airspeed_mps[0]!,
      });
      io.stdout(
        `${JSON.stringify(
          {
            format: 'coversweep-map-guess',
            version: 1,
            data: dataPath,
            map: guess.map,
            notes: guess.notes,
            problems: guess.problems,
          },
          null,
          2,
        )}\n`,
      );
      io.stderr(
        'no --map given: printed the column mapping guessed from the header. Check every line marked CHECK, save the "map" object as MAP.json, and run again with --map MAP.json\n',
      );
      return 0;
    }
    const parsedMap = parseMapFile(readText(io, values.map, 'map file', 1024 * 1024));
    if (!parsedMap.ok) throw new UsageError(parsedMap.errors.map((e) => `${values.map}: ${e}`));

    let parameters: Calibratable[] | undefined;
    if (values.parameters !== undefined) {
      if (!values.calibrate) throw new UsageError(['--parameters: only used with --calibrate']);
      parameters = values.parameters.split(',').map((s) => s.trim()) as Calibratable[];
      for (const p of parameters) {
        if (!CALIBRATABLE.includes(p))
          throw new UsageError([`--parameters: "${p}" is not one of ${CALIBRATABLE.join(', ')}`]);
      }
    }
    const samples = integerOption(values.samples, 'samples', 2, 10000, 64);
    const seed = integerOption(values.seed, 'seed', 0, 0xffffffff, 1);
    const ranges = values.uncertainty !== undefined ? parseUncertainty(values.uncertainty) : null;
    let result: ReturnType<typeof runComparison>;
    try {
      result = runComparison(
        {
          caseFile,
          table: table.value,
          map: parsedMap.value,
          dataLabel: dataPath,
          calibrate: values.calibrate ? (parameters ? { parameters } : {}) : false,
          convergence: values.convergence ? {} : false,
          uncertainty: ranges ? { ranges, options: { samples, seed } } : false,
        },
        modelAtDataHere,
      );
    } catch (error) {
      if (error instanceof RangeError) throw new UsageError([error.message]);
      throw error;
    }
    if (!result.ok) throw new UsageError(result.errors.map((e) => `${dataPath}: ${e}`));
    if (writePath !== undefined && result.value.calibration) {
      const text = `${JSON.stringify(calibratedCase(caseFile, result.value.calibration), null, 2)}\n`;
      const file = new AtomicFile(writePath, values.force === true);
      try {
        file.write(text);
        file.commit();
      } catch (error) {
        file.abort();
        throw error;
      }
    }
    io.stdout(
      format === 'table'
        ? formatCompareTable(result.value)
        : `${JSON.stringify(result.value, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? null : v), 2)}\n`,
    );
    // The table lists the flags itself; with JSON on stdout they are repeated on stderr for a reader.
    if (format === 'json') for (const f of result.value.flags) io.stderr(`flag ${f.code}: ${f.message}\n`);
    if (writeCase !== undefined) io.stderr(`wrote ${writeCase} (the calibrated case)\n`);
    return 0;
  } catch (error) {
    if (error instanceof UsageError) {
      for (const m of error.messages) io.stderr(`coversweep compare: ${m}\n`);
      return 2;
    }
    if (error instanceof CliInputError) {
      io.stderr(`coversweep compare: ${error.message}\n`);
      for (const m of error.messages) io.stderr(`  ${m}\n`);
      return 2;
    }
    if (error instanceof OptionError) {
      io.stderr(`coversweep ${error.message}\nrun "coversweep compare --help" for the usage\n`);
      return 2;
    }
    io.stderr(
      `coversweep compare: internal error: ${error instanceof Error ? error.message : String(error)}\n`,
    );
    return 1;
  }
}

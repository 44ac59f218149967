/**
 * The `coversweep` command line: arguments -> case or plan -> model -> stdout or an atomic file.
 * Exit codes: 0 success, 1 unexpected internal error, 2 invalid input or usage (messages on stderr,
 * nothing on stdout, no file written).
 */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { parseCaseFile, type ResultDocument, solveCase } from '../compute/caseFile';
import { checkJsonFileSize, MAX_JSON_FILE_BYTES } from '../compute/fileVersion';
import {
  HELP_OPTION,
  OUT_OPTIONS,
  onePositional,
  openOutput,
  parseCommandArgs,
  readJsonFile,
} from './commandArgs';
import { HELP } from './commandHelp';
import { runCompare } from './compareCommand';
import { exampleCase, examplePlan } from './examples';
import { formatSolveTable } from './formatSolve';
import { outputFormat } from './formatTable';
import { CliInputError, type CliIo, EXIT_INPUT, EXIT_INTERNAL, EXIT_OK, processIo } from './io';
import { runOptimise } from './optimiseCommand';
import { checkOutputPath } from './outputFile';
import { readInputFile } from './readInputFile';
import { refuseRepeatedOptions } from './refuseRepeatedOptions';
import { runRide } from './rideCommand';
import { commandSweep } from './sweepCommand';
import { runValidate } from './validateCommand';

export { HELP } from './commandHelp';
export { writeSweep } from './sweepCommand';

function version(): string {
  try {
    const pkg = JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as {
      version?: string;
    };
    return pkg.version ?? 'unknown';
  } catch {
    return 'unknown';
  }
}

function commandExample(args: string[], io: CliIo): number {
  const { values, positionals } = parseCommandArgs('example', {
    args,
    options: { plan: { type: 'boolean' }, ...HELP_OPTION },
    allowPositionals: true,
  });
  if (values.help) {
    io.stdout(HELP.example!);
    return EXIT_OK;
  }
  if (positionals.length > 0) throw new CliInputError(`example: unexpected argument ${positionals[0]}`);
  io.stdout(`${JSON.stringify(values.plan ? examplePlan() : exampleCase(), null, 2)}\n`);
  return EXIT_OK;
}

function commandSolve(args: string[], io: CliIo): number {
  refuseRepeatedOptions('solve', args, ['out']);
  const { values, positionals } = parseCommandArgs('solve', {
    args,
    options: { ...OUT_OPTIONS, format: { type: 'string' } },
    allowPositionals: true,
  });
  if (values.help) {
    io.stdout(HELP.solve!);
    return EXIT_OK;
  }
  const path = onePositional('solve', positionals, 'case file');
  const format = outputFormat(values.format);
  const outPath = values.out === undefined ? undefined : resolve(io.cwd, values.out);
  if (outPath !== undefined) checkOutputPath(outPath, values.force === true);
  const parsed = parseCaseFile(readJsonFile(path, io.cwd, 'case file'));
  if (!parsed.ok) throw new CliInputError(`invalid case file ${path}:`, parsed.errors);
  let document: ResultDocument;
  try {
    document = solveCase(parsed.value);
  } catch (error) {
    // The model refuses a case the file rules let through: an input problem, not a crash.
    if (!(error instanceof RangeError)) throw error;
    throw new CliInputError(`the model cannot solve the case in ${path}:`, [error.message]);
  }
  const text = format === 'table' ? formatSolveTable(document) : `${JSON.stringify(document, null, 2)}\n`;
  if (outPath === undefined) {
    io.stdout(text);
  } else {
    const file = openOutput(outPath, values.force === true, io);
    try {
      file.write(text);
      file.commit();
    } catch (error) {
      file.abort();
      throw error;
    }
    io.stderr(`wrote ${values.out}\n`);
  }
  return EXIT_OK;
}

/** Run the command line on `argv` (without node and the script). Returns the exit code. */
export async function main(argv: readonly string[], ioOverrides: Partial<CliIo> = {}): Promise<number> {
  const io: CliIo = { ...processIo(), ...ioOverrides };
  const [command, ...rest] = argv;
  try {
    switch (command) {
      case undefined:
        io.stderr(HELP.main!);
        return EXIT_INPUT;
      case '--help':
      case '-h':
        io.stdout(HELP.main!);
        return EXIT_OK;
      case 'help': {
        const topic = rest[0];
        io.stdout((topic !== undefined && topic !== 'main' && HELP[topic]) || HELP.main!);
        return EXIT_OK;
      }
      case '--version':
        io.stdout(`${version()}\n`);
        return EXIT_OK;
      case 'example':
        return commandExample([...rest], io);
      case 'solve':
        return commandSolve([...rest], io);
      case 'sweep':
        return await commandSweep([...rest], io);
      case 'ride':
        return runRide([...rest], {
          stdout: io.stdout,
          stderr: io.stderr,
          readFile: (path) =>
            readInputFile(resolve(io.cwd, path), MAX_JSON_FILE_BYTES, (bytes) =>
              checkJsonFileSize(bytes, 'ride file'),
            ),
        });
      case 'compare':
        return runCompare([...rest], {
          stdout: io.stdout,
          stderr: io.stderr,
          readFile: (path, maxBytes) => readInputFile(resolve(io.cwd, path), maxBytes),
          fileSize: () => 0, // readFile checks the size of what it reads, whatever stat says
          cwd: io.cwd,
        });
      case 'validate':
        return runValidate([...rest], io);
      case 'optimise':
        return runOptimise([...rest], io);
      default:
        throw new CliInputError(`unknown command "${command}"`, [
          'commands: example, solve, sweep, ride, compare, validate (see coversweep --help)',
        ]);
    }
  } catch (error) {
    if (error instanceof CliInputError) {
      io.stderr(`coversweep: error: ${error.message}\n`);
      for (const m of error.messages) io.stderr(`  ${m.trimEnd().replace(/\n/g, '\n  ')}\n`);
      return EXIT_INPUT;
    }
    const detail = error instanceof Error ? (error.stack ?? error.message) : String(error);
    io.stderr(`coversweep: internal error (please report it): ${detail}\n`);
    return EXIT_INTERNAL;
  }
}

/**
 * The `coversweep` command line: arguments -> case or plan -> model -> stdout or an atomic file.
 * Exit codes: 0 success, 1 unexpected internal error, 2 invalid input or usage (messages on stderr,
 * nothing on stdout, no file written).
 *
 * Each command's module is imported when that command runs (the compiled build keeps them in their own
 * chunks), so `--help` loads only this file and the help text, and a sweep's worker threads start
 * before the sweep's own modules load (sweepPrestart.ts).
 */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { HELP } from './commandHelp';
import { CliInputError, type CliIo, EXIT_INPUT, EXIT_INTERNAL, EXIT_OK, processIo } from './io';
import { sweepPrestart } from './sweepPrestart';

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
        return (await import('./exampleCommand')).commandExample([...rest], io);
      case 'solve':
        return (await import('./solveCommand')).commandSolve([...rest], io);
      case 'sweep': {
        // A sweep's workers (--workers N) start booting now, while the sweep's modules load.
        const early = sweepPrestart(rest, io.workerEntry);
        return await (await import('./sweepCommand')).commandSweep([...rest], io, early);
      }
      case 'ride': {
        const [{ runRide }, { readInputFile }, { checkJsonFileSize, MAX_JSON_FILE_BYTES }] =
          await Promise.all([
            import('./rideCommand'),
            import('./readInputFile'),
            import('../compute/fileVersion'),
          ]);
        return runRide([...rest], {
          stdout: io.stdout,
          stderr: io.stderr,
          readFile: (path) =>
            readInputFile(resolve(io.cwd, path), MAX_JSON_FILE_BYTES, (bytes) =>
              checkJsonFileSize(bytes, 'ride file'),
            ),
        });
      }
      case 'compare': {
        const [{ runCompare }, { readInputFile }] = await Promise.all([
          import('./compareCommand'),
          import('./readInputFile'),
        ]);
        return runCompare([...rest], {
          stdout: io.stdout,
          stderr: io.stderr,
          readFile: (path, maxBytes) => readInputFile(resolve(io.cwd, path), maxBytes),
          fileSize: () => 0, // readFile checks the size of what it reads, whatever stat says
          cwd: io.cwd,
        });
      }
      case 'validate':
        return (await import('./validateCommand')).runValidate([...rest], io);
      case 'optimise':
        return (await import('./optimiseCommand')).runOptimise([...rest], io);
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

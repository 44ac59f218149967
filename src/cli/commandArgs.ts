/** Option parsing, input reading and output opening shared by the commands. */
import { resolve } from 'node:path';
import type { ParseArgsConfig } from 'node:util';
import { checkJsonFileSize, MAX_JSON_FILE_BYTES } from '../compute/fileVersion';
import { HELP } from './commandHelp';
import type { CliIo } from './io';
import { CliInputError, readErrorReason } from './io';
import { AtomicFile } from './outputFile';
import { parseOptions } from './parseOptions';
import { InputFileError, readInputFile } from './readInputFile';

/** Parse a command's options, turning complaints into usage errors (exit 2) with a nearest-option hint. */
export function parseCommandArgs<T extends ParseArgsConfig>(command: string, config: T) {
  try {
    return parseOptions(command, config);
  } catch (error) {
    throw new CliInputError(error instanceof Error ? error.message : String(error), [
      `see: coversweep ${command} --help`,
    ]);
  }
}

export const HELP_OPTION = { help: { type: 'boolean', short: 'h' } } as const;
export const OUT_OPTIONS = { out: { type: 'string' }, force: { type: 'boolean' }, ...HELP_OPTION } as const;

/** Read one of our JSON files: a regular file within the size limit, as strict UTF-8 (readInputFile). */
export function readJsonFile(path: string, cwd: string, what: string): string {
  try {
    return readInputFile(resolve(cwd, path), MAX_JSON_FILE_BYTES, (bytes) => checkJsonFileSize(bytes, what));
  } catch (error) {
    if (error instanceof InputFileError && error.whole) throw new CliInputError(error.message);
    throw new CliInputError(`cannot read the ${what} ${path}: ${readErrorReason(error)}`);
  }
}

export function onePositional(command: string, positionals: string[], what: string): string {
  if (positionals.length === 0)
    throw new CliInputError(`${command}: missing the ${what} argument`, [HELP[command]!]);
  if (positionals.length > 1) {
    throw new CliInputError(
      `${command}: expected one ${what}, got ${positionals.length}: ${positionals.join(' ')}`,
    );
  }
  return positionals[0]!;
}

/** The atomic output file, reporting temporary files of killed runs it removed (`flushInBackground`:
 * see AtomicFile). */
export function openOutput(path: string, force: boolean, io: CliIo, flushInBackground = false): AtomicFile {
  const file = new AtomicFile(path, force, flushInBackground);
  for (const stale of file.removedStale) {
    io.stderr(`coversweep: removed ${stale}, a temporary file left by an earlier run that was killed\n`);
  }
  return file;
}

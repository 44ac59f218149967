/**
 * node:util parseArgs with the command line's own messages: an unknown option is named with the
 * nearest known one ("unknown option --outt (did you mean --out?)") instead of parseArgs' raw text with
 * its quoting advice; a missing value and an unexpected argument are named plainly. The errors thrown
 * are `OptionError`s (a usage error: exit code 2) whose message starts with the command's name.
 */
import { type ParseArgsConfig, parseArgs } from 'node:util';
import { nearestName } from '../compute/nearestName';

export class OptionError extends Error {}

type Options = NonNullable<ParseArgsConfig['options']>;

/** The message for parseArgs' error `error` on a command with `options`, or null when it is not one. */
export function optionErrorMessage(command: string, error: unknown, options: Options): string | null {
  if (!(error instanceof Error)) return null;
  const code = (error as { code?: unknown }).code;
  const quoted = error.message.match(/'([^']*)'/)?.[1] ?? '';
  if (code === 'ERR_PARSE_ARGS_UNKNOWN_OPTION') {
    const given = quoted.replace(/=.*$/, '');
    const names = Object.keys(options).map((n) => `--${n}`);
    const near = given.startsWith('--') ? nearestName(given, names) : null;
    return `${command}: unknown option ${given}${near ? ` (did you mean ${near}?)` : ''}`;
  }
  if (code === 'ERR_PARSE_ARGS_INVALID_OPTION_VALUE') {
    const name = quoted.match(/--[\w-]+/)?.[0] ?? quoted;
    if (/argument missing/.test(error.message)) return `${command}: option ${name} needs a value`;
    return `${command}: option ${name} takes no value`;
  }
  if (code === 'ERR_PARSE_ARGS_UNEXPECTED_POSITIONAL') return `${command}: unexpected argument ${quoted}`;
  return null;
}

/** parseArgs (strict) for `command`, its errors turned into OptionErrors with plain messages. */
export function parseOptions<T extends ParseArgsConfig>(command: string, config: T) {
  try {
    return parseArgs({ ...config, strict: true });
  } catch (error) {
    const message = optionErrorMessage(command, error, config.options ?? {});
    if (message === null) throw error;
    throw new OptionError(message);
  }
}

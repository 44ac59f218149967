import { CliInputError } from './io';

/**
 * Refuse an option given twice (`--out a --out b`): which one was meant is ambiguous, so neither is
 * guessed (node:util parseArgs would silently keep the last). `names` are the long option names that
 * take a value; both `--name value` and `--name=value` count.
 */
export function refuseRepeatedOptions(
  command: string,
  args: readonly string[],
  names: readonly string[],
): void {
  for (const name of names) {
    const flag = `--${name}`;
    const given: string[] = [];
    for (let i = 0; i < args.length; i++) {
      const arg = args[i]!;
      if (arg === '--') break;
      if (arg === flag) {
        given.push(args[i + 1] ?? '');
        i++;
      } else if (arg.startsWith(`${flag}=`)) {
        given.push(arg.slice(flag.length + 1));
      }
    }
    if (given.length > 1) {
      throw new CliInputError(
        `${command}: ${flag} given ${given.length} times (${given.join(', ')}); give it once`,
      );
    }
  }
}

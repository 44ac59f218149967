/** `coversweep example [--plan]`: an example case (or plan) file on stdout. */
import { HELP_OPTION, parseCommandArgs } from './commandArgs';
import { HELP } from './commandHelp';
import { exampleCase, examplePlan } from './examples';
import { CliInputError, type CliIo, EXIT_OK } from './io';

export function commandExample(args: string[], io: CliIo): number {
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

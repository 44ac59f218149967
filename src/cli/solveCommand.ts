/** `coversweep solve CASE.json`: one case solved here; its result document or table to stdout or a file. */
import { resolve } from 'node:path';
import { parseCaseFile, type ResultDocument, solveCase } from '../compute/caseFile';
import { OUT_OPTIONS, onePositional, openOutput, parseCommandArgs, readJsonFile } from './commandArgs';
import { HELP } from './commandHelp';
import { formatSolveTable } from './formatSolve';
import { outputFormat } from './formatTable';
import { CliInputError, type CliIo, EXIT_OK } from './io';
import { checkOutputPath } from './outputFile';
import { refuseRepeatedOptions } from './refuseRepeatedOptions';

export function commandSolve(args: string[], io: CliIo): number {
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

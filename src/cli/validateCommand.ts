/**
 * `coversweep validate`: run the built-in reference set (src/compute/validation) and print each case with
 * its source, the strength of the reference, the reference value and band, the model's value and PASS or
 * FAIL; --json prints the same as a document. Exit codes: 0 every case passed or failed only as a
 * documented known disagreement, 1 some other case failed (or an internal error), 2 usage.
 */
import { formatValidationTable, runValidation } from '../compute/validation/index';
import { parseOptions } from './parseOptions';

export const VALIDATE_HELP = `Usage: coversweep validate [--json]

Run the built-in reference set: whole wheels against published or trade figures (drag of a disc and of a
32-spoke wheel, the power to spin a wheel, axial drag at yaw, side force), the lifting surface against
exact theory, and each model part (friction, air, grid convergence, power model) against its published
value. For every case it prints what the case is, the source, how strong the reference is (measured,
CFD, theory, handbook, trade practice from memory, ...), the reference value and its band, the model's
value and PASS or FAIL. The cases are solved exactly as \`coversweep solve\` solves a case file.

Options:
  --json       print the report as JSON (format "coversweep-validation") instead of the table
  --help       show this help

Exit codes: 0 every case passed or failed only as a documented known disagreement, 1 at least one
other case failed (or an internal error), 2 usage.
`;

export interface ValidateIo {
  stdout: (s: string) => void;
  stderr: (s: string) => void;
}

/** Run `validate` on its arguments (after the command name). Returns the exit code. */
export function runValidate(argv: string[], io: ValidateIo): number {
  let values: { json?: boolean; help?: boolean };
  try {
    ({ values } = parseOptions('validate', {
      args: argv,
      options: { json: { type: 'boolean' }, help: { type: 'boolean', short: 'h' } },
      allowPositionals: false,
    }));
  } catch (error) {
    io.stderr(`coversweep: error: ${error instanceof Error ? error.message : String(error)}\n`);
    io.stderr('  see: coversweep validate --help\n');
    return 2;
  }
  if (values.help) {
    io.stdout(VALIDATE_HELP);
    return 0;
  }
  const report = runValidation();
  io.stdout(values.json ? `${JSON.stringify(report, null, 2)}\n` : formatValidationTable(report));
  const failedRows = report.rows.filter((r) => !r.pass);
  const known = failedRows.filter((r) => r.known_disagreement !== null).map((r) => r.id);
  const unexpected = failedRows.filter((r) => r.known_disagreement === null).map((r) => r.id);
  if (known.length > 0) {
    io.stderr(`validate: known disagreement(s), documented: ${known.join(', ')}\n`);
  }
  if (unexpected.length > 0) {
    io.stderr(
      `validate: ${unexpected.length} of ${report.rows.length} reference case(s) failed: ${unexpected.join(', ')}\n`,
    );
    return 1;
  }
  return 0;
}

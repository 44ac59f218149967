/** The help text of each command (`coversweep <command> --help`) and the sweep limits it quotes. */
/** Points per pooled job to aim for at most (memory per job in flight; see writeSweep). */
export const MAX_JOB_POINTS = 20_000;

/** Below this many cases a sweep runs in-process by default: worker start-up (~1 s) would dominate. */
export const MIN_CASES_FOR_POOL = 8;

export const HELP: Record<string, string> = {
  main: `coversweep: reduced-order aerodynamics of covered and deep-rim bicycle wheels

Usage:
  coversweep example [--plan]              print an example case (or plan) file
  coversweep solve CASE.json [--out F]     solve one case; the result document (JSON) on stdout or in F
  coversweep sweep PLAN.json [--out F]     solve every case of a plan; CSV (or JSON if F ends in .json)
  coversweep ride RIDE.json                a design against a baseline on the road: watts, seconds,
                                           wind-averaged drag, crosswind handling (JSON on stdout)
  coversweep compare CASE.json DATA.csv    hold measured or simulated data against the model:
                                           unit and axis slips, residuals, --calibrate
  coversweep optimise STUDY.json           the best cover and rim for a ride within handling limits
  coversweep validate [--json]             the model against the built-in reference cases (published
                                           and exact values, with sources and bands): PASS or FAIL
  coversweep <command> --help              help on one command

Options:
  --help, -h      show help
  --version       print the version

Exit codes: 0 success, 1 internal error (validate: a reference case failed), 2 invalid input or usage
(nothing on stdout, no file written).
Results are estimates from a reduced-order model: allow margin for gusts and lighter riders, and rely on
qualified testing and the competition's rules before riding a design.
`,
  example: `Usage: coversweep example [--plan]

Print an example case file (an invented wheel, "Demo 50 mm half-cover") on stdout, or with --plan an
example plan file that varies rim depth and cover fraction. Save it, edit it, then run
  coversweep solve case.json      or      coversweep sweep plan.json --out results.csv
`,
  solve: `Usage: coversweep solve CASE.json [--out RESULT.json] [--force] [--format json|table]

Solve one case file: every airspeed x yaw angle it lists. Prints the result document (JSON,
format "coversweep-result") on stdout, or writes it to --out atomically.

Options:
  --out FILE   write the document to FILE instead of stdout (refuses to overwrite without --force)
  --force      allow --out to replace an existing file
  --format F   json (default): the result document; table: a readable summary of the same results
  --help       show this help
`,
  sweep: `Usage: coversweep sweep PLAN.json [--out results.csv|results.json] [--workers N] [--force]

Expand a plan file (a case file whose leaves may be lists or {"from","to","step"} ranges) into the
Cartesian product of its cases, solve them all, and write a table: one row per case and operating
point, the varied parameters first (named by key path), then the result columns. Without --out the
CSV goes to stdout. Progress is shown on stderr.

Options:
  --out FILE     write to FILE (.csv: the table; .json: every case's result document), atomically
  --workers N    solver worker threads (default: the machine's core count; plans of fewer than
                 ${MIN_CASES_FOR_POOL} cases run in this process unless N is given; 0 = in this process)
  --force        allow --out to replace an existing file
  --help         show this help

A case the model rejects becomes a row with its message in the "error" column; the sweep goes on and
reports how many failed (exit code 0 when some cases ran, 2 when every case failed).
`,
};

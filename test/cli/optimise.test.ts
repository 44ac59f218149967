import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { exampleStudy } from '../../src/cli/examples';
import { main } from '../../src/cli/main';
import { optimiseStudy, parseStudyFile, studyDocument } from '../../src/compute/design/index';
import { parseCsvLine } from '../../src/compute/resultTable';
import { RIDE_CAUTIONS } from '../../src/compute/ride/index';

const dir = mkdtempSync(join(tmpdir(), 'coversweep-optimise-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** The example study made small: a 3 x 3 start grid on an 8 x 4 lattice, 40 evaluations. */
function smallStudy(): Record<string, unknown> {
  const s = exampleStudy();
  s.search = {
    grid_points: 3,
    starts: 2,
    max_evaluations: 40,
    tolerance: 0.01,
    lattice_span: 8,
    lattice_chord: 4,
  };
  s.front = { handling: 'steering_gust_Nm', limit_steps: 1 };
  return s;
}

async function run(args: string[]) {
  let stdout = '';
  let stderr = '';
  const code = await main(args, {
    stdout: (s) => {
      stdout += s;
    },
    stderr: (s) => {
      stderr += s;
    },
    stderrIsTTY: false,
    cwd: dir,
  });
  return { code, stdout, stderr };
}

describe('coversweep optimise', () => {
  it('writes the result (JSON) and the designs (CSV): the numbers of the compute layer, the cautions in both', async () => {
    const text = JSON.stringify(smallStudy());
    writeFileSync(join(dir, 'study.json'), text);
    const r = await run(['optimise', 'study.json', '--json', 'out.json', '--csv', 'out.csv']);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/optimise: .*designs evaluated/);
    const doc = JSON.parse(readFileSync(join(dir, 'out.json'), 'utf8'));
    expect(doc.format).toBe('coversweep-study-result');
    expect(doc.cautions).toEqual(RIDE_CAUTIONS);
    // The same numbers straight from the compute layer (deterministic).
    const parsed = parseStudyFile(text);
    if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
    const direct = JSON.parse(JSON.stringify(studyDocument(optimiseStudy(parsed.value))));
    expect(doc).toEqual(direct);
    const lines = readFileSync(join(dir, 'out.csv'), 'utf8').trimEnd().split('\n').map(parseCsvLine);
    const header = lines[0]!;
    expect(header.slice(0, 4)).toEqual(['role', 'index', 'cover_fraction', 'rim_depth_m']);
    expect(lines.filter((l) => l[0] === 'caution').map((l) => l[header.indexOf('note')])).toEqual(
      RIDE_CAUTIONS,
    );
    const opt = lines.find((l) => l[0] === 'optimum')!;
    expect(Number(opt[header.indexOf('time_s')])).toBe(doc.optimum.objectives.time_s);
    expect(lines.filter((l) => ['optimum', 'front', 'design'].includes(l[0]!)).length).toBe(
      doc.search.evaluations,
    );
  });

  it('without --json or --csv the result goes to stdout', async () => {
    writeFileSync(join(dir, 'study2.json'), JSON.stringify(smallStudy()));
    const r = await run(['optimise', 'study2.json']);
    expect(r.code, r.stderr).toBe(0);
    expect(JSON.parse(r.stdout).optimum.meets_limits).toBe(true);
  });

  it('when no design meets the limits: exit 0, the least violating design, said plainly', async () => {
    const s = smallStudy();
    s.limits = { steering_gust_Nm: 0.01 };
    writeFileSync(join(dir, 'strict.json'), JSON.stringify(s));
    const r = await run(['optimise', 'strict.json', '--json', 'strict-out.json']);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stderr).toContain('no design met every limit; least violating design');
    const doc = JSON.parse(readFileSync(join(dir, 'strict-out.json'), 'utf8'));
    expect(doc.feasible).toBe(false);
    const least = Math.min(...doc.designs.map((d: { violation: number }) => d.violation));
    expect(doc.optimum.violation).toBe(least);
  });

  it('an invalid study: exit 2, the field and the rule on stderr, nothing on stdout, no file', async () => {
    const s = smallStudy();
    (s.variables as Record<string, unknown>).cover_fraction = { min: 0, max: 2 };
    writeFileSync(join(dir, 'bad.json'), JSON.stringify(s));
    const r = await run(['optimise', 'bad.json', '--json', 'bad-out.json']);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toContain('invalid study file bad.json');
    expect(r.stderr).toContain('variables.cover_fraction.max: must be at most 1, got 2');
    expect(() => readFileSync(join(dir, 'bad-out.json'))).toThrow();
  });

  it('an existing output is kept unless --force (checked before any work)', async () => {
    writeFileSync(join(dir, 'taken.json'), 'mine');
    writeFileSync(join(dir, 'study3.json'), JSON.stringify(smallStudy()));
    const r = await run(['optimise', 'study3.json', '--json', 'taken.json']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('already exists; use --force');
    expect(readFileSync(join(dir, 'taken.json'), 'utf8')).toBe('mine');
  });

  it('--example prints the example study (public/examples/study.json); --help the usage; usage errors exit 2', async () => {
    const e = await run(['optimise', '--example']);
    expect(e.code).toBe(0);
    const saved = JSON.parse(
      readFileSync(new URL('../../public/examples/study.json', import.meta.url), 'utf8'),
    );
    expect(JSON.parse(e.stdout)).toEqual(saved);
    const h = await run(['optimise', '--help']);
    expect(h.stdout).toMatch(/^Usage: coversweep optimise STUDY.json/);
    expect((await run(['optimise'])).code).toBe(2);
    expect((await run(['optimise', 'a.json', 'b.json'])).code).toBe(2);
    expect((await run(['optimise', '--bogus'])).code).toBe(2);
    expect((await run(['optimise', '/nonexistent/study.json'])).stderr).toContain('no such file');
  });
});

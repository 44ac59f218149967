// The layout check (scripts/checkLayout.mjs) against small fixture trees: each kind of problem it must
// catch is planted once and must be reported, and a clean tree must pass, so the check cannot pass silently.
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { checkLayout, importSpecifiers } from '../../scripts/checkLayout.mjs';

const roots: string[] = [];

function tree(files: Record<string, string>): string {
  const root = mkdtempSync(join(tmpdir(), 'layout-'));
  roots.push(root);
  for (const [path, text] of Object.entries(files)) {
    mkdirSync(dirname(join(root, path)), { recursive: true });
    writeFileSync(join(root, path), text);
  }
  return root;
}

const clean = {
  'src/model/a/area.ts': 'export const area = 1;\n',
  'src/model/b/useArea.ts': "import { area } from '../a/area';\nexport const twice = 2 * area;\n",
  'src/compute/plan.ts': "import { twice } from '../model/b/useArea';\nexport const plan = twice;\n",
  'src/ui/page.ts': "import { plan } from '../compute/plan';\nexport const page = plan;\n",
  'src/cli/main.ts': "import type { plan } from '../compute/plan';\nexport type P = typeof plan;\n",
  // A folder and its subfolder may import each other (a barrel and its parts), not a file cycle.
  'src/compute/part/piece.ts': "import { plan } from '../plan';\nexport const piece = plan;\n",
  'src/compute/barrel.ts': "export { piece } from './part/piece';\n",
};

afterEach(() => {
  for (const root of roots.splice(0)) rmSync(root, { recursive: true, force: true });
});

describe('checkLayout', () => {
  it('passes a clean tree', () => {
    const result = checkLayout(tree(clean), { pendingSplit: {} });
    expect(result.problems, JSON.stringify(result.problems)).toEqual([]);
    expect(result.fileCount).toBe(7);
  });

  it('reports an import cycle between files, type-only imports included', () => {
    const root = tree({
      ...clean,
      'src/compute/x.ts': "import { y } from './y';\nexport const x = y;\n",
      'src/compute/y.ts': "import type { Z } from './z';\nexport const y = 1 as Z;\n",
      'src/compute/z.ts': "import type { x } from './x';\nexport type Z = typeof x;\n",
    });
    const { problems } = checkLayout(root, { pendingSplit: {} });
    expect(problems).toEqual([
      'cycle: src/compute/x.ts -> src/compute/y.ts -> src/compute/z.ts -> src/compute/x.ts',
    ]);
  });

  it('reports a cycle between folders made of different files', () => {
    const root = tree({
      ...clean,
      'src/model/a/back.ts': "import { twice } from '../b/useArea';\nexport const back = twice;\n",
    });
    const { problems } = checkLayout(root, { pendingSplit: {} });
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatch(/^folder cycle: src\/model\/a -> src\/model\/b -> src\/model\/a /);
  });

  it('reports a ui import of src/model and a model import of src/compute, dynamic imports included', () => {
    const root = tree({
      ...clean,
      'src/ui/bad.ts': "export const load = () => import('../model/a/area');\n",
      'src/model/a/up.ts': "export { plan } from '../../compute/plan';\n",
      'src/cli/bad.ts': "import {\n  area,\n} from '../model/a/area';\nexport const a = area;\n",
    });
    const { problems } = checkLayout(root, { pendingSplit: {} });
    expect(problems.filter((p) => p.startsWith('layer:'))).toEqual([
      "layer: src/cli/bad.ts imports src/model/a/area.ts ('../model/a/area'): src/cli may import only src/compute",
      "layer: src/model/a/up.ts imports src/compute/plan.ts ('../../compute/plan'): src/model may import only itself",
      "layer: src/ui/bad.ts imports src/model/a/area.ts ('../model/a/area'): src/ui may import only src/compute",
    ]);
  });

  it('reports a file over the line limit, unless it is in the pending-split allowance', () => {
    const long = `${Array.from({ length: 12 }, (_, i) => `export const v${i} = ${i};`).join('\n')}\n`;
    const root = tree({ ...clean, 'src/compute/long.ts': long, 'src/compute/ok.ts': long });
    const strict = checkLayout(root, { pendingSplit: {}, maxLines: 11 });
    expect(strict.problems).toEqual([
      'size: src/compute/long.ts has 12 lines (at most 11)',
      'size: src/compute/ok.ts has 12 lines (at most 11)',
    ]);
    const allowed = checkLayout(root, {
      pendingSplit: { 'src/compute/ok.ts': { size: true } },
      maxLines: 11,
    });
    expect(allowed.problems).toEqual(['size: src/compute/long.ts has 12 lines (at most 11)']);
    expect(allowed.allowancesUsed).toEqual(['size: src/compute/ok.ts has 12 lines (at most 11)']);
  });

  it('an allowance for size does not excuse a layer import', () => {
    const root = tree({
      ...clean,
      'src/ui/bad.ts': "import { area } from '../model/a/area';\nexport const a = area;\n",
    });
    const { problems } = checkLayout(root, { pendingSplit: { 'src/ui/bad.ts': { size: true } } });
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatch(/^layer: src\/ui\/bad.ts imports src\/model\/a\/area.ts/);
  });

  it('reads imports, re-exports and dynamic imports but not look-alikes in code', () => {
    const text = [
      "import a from './a';",
      "import type { B } from './b';",
      "import './c';",
      "export * from './d';",
      'export {',
      '  e,',
      "} from './e';",
      "const f = () => import('./f');",
      "export const g = 'from ./g';",
      "export function h() { return 'x'; }",
    ].join('\n');
    expect(importSpecifiers(text)).toEqual(['./a', './b', './c', './d', './e', './f']);
  });
});

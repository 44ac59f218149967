#!/usr/bin/env node
// The layout check run by `npm test`: the import graph of src/ has no cycle (between files, nor between
// folders), the layers point one way
// (ui -> compute -> model, cli -> compute -> model), and no source file is longer than MAX_LINES.
// Every relative import counts, `import type` included (a type cycle is still a cycle for a reader).
// Usage: node scripts/checkLayout.mjs [root]   (root defaults to the repository; exits 1 on a problem)
import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative, resolve, sep } from 'node:path';
import { fileURLToPath } from 'node:url';

export const MAX_LINES = 400;

// Files allowed, for a while, to break the size or layer rule while they are being split on another
// branch: `'src/path.ts': { size: true, layers: true }`, each with a comment saying why. Printed on
// every run. Empty: every file in src/ keeps every rule.
export const PENDING_SPLIT = {};

// Which top-level folder of src/ may import which (a folder may always import itself).
export const LAYERS = {
  model: [],
  compute: ['model'],
  ui: ['compute'],
  cli: ['compute'],
};

const SOURCE = /\.(ts|tsx|mts|js|mjs)$/;
const STATIC_IMPORT = /^\s*(?:import|export)\s(?:[^'"`;]*?\sfrom\s*)?['"]([^'"]+)['"]/gm;
const DYNAMIC_IMPORT = /\bimport\(\s*['"]([^'"]+)['"]\s*\)/g;

function listSources(dir) {
  const out = [];
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) out.push(...listSources(path));
    else if (SOURCE.test(entry.name) && !entry.name.endsWith('.d.ts')) out.push(path);
  }
  return out.sort();
}

/** The import specifiers written in a source text (static, re-exports and dynamic `import('...')`). */
export function importSpecifiers(text) {
  const found = [];
  for (const m of text.matchAll(STATIC_IMPORT)) found.push(m[1]);
  for (const m of text.matchAll(DYNAMIC_IMPORT)) found.push(m[1]);
  return found;
}

function resolveImport(fromFile, specifier, known) {
  if (!specifier.startsWith('.')) return undefined; // a package
  const bare = resolve(dirname(fromFile), specifier.replace(/[?#].*$/, ''));
  const base = bare.replace(/\.(js|mjs)$/, '');
  for (const candidate of [
    bare,
    `${base}.ts`,
    `${base}.tsx`,
    `${base}.mts`,
    `${bare}.js`,
    `${bare}.mjs`,
    join(bare, 'index.ts'),
  ]) {
    if (known.has(candidate)) return candidate;
  }
  return undefined;
}

/** Strongly connected components with more than one file, or a file importing itself (Tarjan 1972). */
export function findCycles(graph) {
  let index = 0;
  const indexOf = new Map();
  const low = new Map();
  const stack = [];
  const onStack = new Set();
  const cycles = [];
  const visit = (v) => {
    indexOf.set(v, index);
    low.set(v, index);
    index += 1;
    stack.push(v);
    onStack.add(v);
    for (const w of graph.get(v) ?? []) {
      if (!indexOf.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v), low.get(w)));
      } else if (onStack.has(w)) low.set(v, Math.min(low.get(v), indexOf.get(w)));
    }
    if (low.get(v) === indexOf.get(v)) {
      const component = [];
      let w;
      do {
        w = stack.pop();
        onStack.delete(w);
        component.push(w);
      } while (w !== v);
      if (component.length > 1 || (graph.get(v) ?? []).includes(v)) cycles.push(component.sort());
    }
  };
  for (const v of [...graph.keys()].sort()) if (!indexOf.has(v)) visit(v);
  return cycles;
}

/** One shortest path of imports from `start` back to itself inside `members`, for the message. */
function cyclePath(graph, start, members) {
  const previous = new Map([[start, undefined]]);
  const queue = [start];
  while (queue.length > 0) {
    const v = queue.shift();
    for (const w of graph.get(v) ?? []) {
      if (!members.has(w)) continue;
      if (w === start) {
        const path = [start];
        for (let u = v; u !== start; u = previous.get(u)) path.splice(1, 0, u);
        return [...path, start];
      }
      if (!previous.has(w)) {
        previous.set(w, v);
        queue.push(w);
      }
    }
  }
  return [start, start];
}

/**
 * Check the tree under `root` (its src/ folder). Returns the problems found (one line each, empty when
 * the layout is clean) and the allowances that were used.
 */
export function checkLayout(root, { pendingSplit = PENDING_SPLIT, maxLines = MAX_LINES } = {}) {
  const srcDir = join(root, 'src');
  const files = listSources(srcDir);
  const known = new Set(files);
  const rel = (path) => relative(root, path).split(sep).join('/');
  const layerOf = (path) => rel(path).split('/')[1];
  const graph = new Map();
  const problems = [];
  const allowancesUsed = [];
  for (const file of files) {
    const text = readFileSync(file, 'utf8');
    const name = rel(file);
    const allowance = pendingSplit[name] ?? {};
    const targets = [];
    for (const specifier of importSpecifiers(text)) {
      const target = resolveImport(file, specifier, known);
      if (target === undefined) continue;
      targets.push(target);
      const from = layerOf(file);
      const to = layerOf(target);
      const allowed = LAYERS[from];
      if (from === to || allowed === undefined || allowed.includes(to)) continue;
      const line = `${name} imports ${rel(target)} ('${specifier}'): src/${from} may import only ${
        allowed.length > 0 ? allowed.map((l) => `src/${l}`).join(', ') : 'itself'
      }`;
      if (allowance.layers) allowancesUsed.push(`layers: ${line}`);
      else problems.push(`layer: ${line}`);
    }
    graph.set(file, [...new Set(targets)]);
    const lines = text.split('\n').length - (text.endsWith('\n') ? 1 : 0);
    if (lines > maxLines) {
      const line = `${name} has ${lines} lines (at most ${maxLines})`;
      if (allowance.size) allowancesUsed.push(`size: ${line}`);
      else problems.push(`size: ${line}`);
    }
  }
  for (const component of findCycles(graph)) {
    const path = cyclePath(graph, component[0], new Set(component));
    problems.push(`cycle: ${path.map(rel).join(' -> ')}`);
  }
  // Folders too: two folders importing each other (through different files) are one concept split
  // in two, or two concepts tangled; either way one of them should move. A folder and its own
  // subfolder are exempt (a barrel re-exporting its subfolder, which uses the folder's shared helpers).
  const folderGraph = new Map();
  const folderEdge = new Map();
  for (const [file, targets] of graph) {
    const from = rel(dirname(file));
    for (const target of targets) {
      const to = rel(dirname(target));
      if (to === from || to.startsWith(`${from}/`) || from.startsWith(`${to}/`)) continue;
      if (!folderGraph.has(from)) folderGraph.set(from, []);
      if (!folderGraph.get(from).includes(to)) folderGraph.get(from).push(to);
      if (!folderEdge.has(`${from} ${to}`)) folderEdge.set(`${from} ${to}`, `${rel(file)} -> ${rel(target)}`);
    }
  }
  for (const component of findCycles(folderGraph)) {
    const path = cyclePath(folderGraph, component[0], new Set(component));
    const via = path.slice(1).map((to, i) => folderEdge.get(`${path[i]} ${to}`));
    problems.push(`folder cycle: ${path.join(' -> ')} (${via.join('; ')})`);
  }
  return { problems, allowancesUsed, fileCount: files.length };
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const root = resolve(process.argv[2] ?? join(dirname(fileURLToPath(import.meta.url)), '..'));
  const { problems, allowancesUsed, fileCount } = checkLayout(root);
  if (Object.keys(PENDING_SPLIT).length > 0) {
    console.log('pending split: allowed until the split of these files on other branches lands');
  }
  for (const [file, allowance] of Object.entries(PENDING_SPLIT)) {
    const rules = [
      allowance.size ? `over ${MAX_LINES} lines` : '',
      allowance.layers ? 'src/model imports' : '',
    ]
      .filter((r) => r !== '')
      .join(' and ');
    console.log(`  ${file}: may have ${rules}`);
  }
  for (const line of allowancesUsed) console.log(`  used: ${line}`);
  for (const line of problems) console.error(line);
  console.log(
    `layout: ${fileCount} files in src/, ${problems.length} problem(s) (cycles, layers ui/cli -> compute -> model, at most ${MAX_LINES} lines)`,
  );
  process.exit(problems.length > 0 ? 1 : 0);
}

/** Messages about values found in a file: a short printable description, and a key path. */

/** A short, printable description of a value found in a file. */
export function describeValue(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : String(value);
  let text: string;
  try {
    text = JSON.stringify(value) ?? String(value);
  } catch {
    // Cyclic or too deeply nested to print (String() would recurse as deeply).
    text = Array.isArray(value) ? '[...]' : '{...}';
  }
  if (Array.isArray(value)) text = `a list ${text}`;
  else if (value !== null && typeof value === 'object') text = `an object ${text}`;
  return text.length > 60 ? `${text.slice(0, 57)}...` : text;
}

/** Key path text: `wheel.cover.fraction`, `conditions.yaw_deg[2]`. */
export function keyPathText(path: readonly PropertyKey[]): string {
  let out = '';
  for (const key of path) {
    if (typeof key === 'number') out += `[${key}]`;
    else out += out === '' ? String(key) : `.${String(key)}`;
  }
  return out === '' ? '(top level)' : out;
}

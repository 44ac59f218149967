import { nearestName } from './nearestName';

/**
 * The message for an unknown key in one of our JSON files, naming the nearest allowed key when one is
 * close: `wheel.rim_dept_m: unknown key (did you mean wheel.rim_depth_m?) (allowed here: ...)`.
 * `where` is the key path of the enclosing object ('' at the top level).
 */
export function unknownKeyMessage(
  where: string,
  key: string,
  allowed: readonly string[] | undefined,
): string {
  const keyPath = where === '' ? key : `${where}.${key}`;
  const near = allowed ? nearestName(key, allowed) : null;
  const hint = near === null ? '' : ` (did you mean ${where === '' ? near : `${where}.${near}`}?)`;
  return `${keyPath}: unknown key${hint}${allowed ? ` (allowed here: ${allowed.join(', ')})` : ''}`;
}

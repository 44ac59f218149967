import type { AppState } from './appState';

/** Whether `next` differs from `prev` only in its imported data (the other parts are the same objects). */
export function onlyDataChanged(prev: AppState, next: AppState): boolean {
  if (prev === next || prev.data === next.data) return false;
  const keys = new Set([...Object.keys(prev), ...Object.keys(next)]);
  for (const k of keys)
    if (k !== 'data' && prev[k as keyof AppState] !== next[k as keyof AppState]) return false;
  return true;
}

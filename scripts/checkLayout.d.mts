// Types of scripts/checkLayout.mjs, for its test.
export interface Allowance {
  size?: boolean;
  layers?: boolean;
}
export const MAX_LINES: number;
export const PENDING_SPLIT: Record<string, Allowance>;
export const LAYERS: Record<string, string[]>;
export function importSpecifiers(text: string): string[];
export function findCycles(graph: Map<string, string[]>): string[][];
export function checkLayout(
  root: string,
  options?: { pendingSplit?: Record<string, Allowance>; maxLines?: number },
): { problems: string[]; allowancesUsed: string[]; fileCount: number };

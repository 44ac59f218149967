import type { CaseFile } from '../../compute/caseFile';
import { caseDifferences } from './caseDifferences';

/** Longest part of a design's name shown in a legend (characters). */
const NAME_CHARS = 32;

/**
 * A pinned baseline's name on the page: its number, "reference" for the one differences use, the
 * design's name (shortened) and what differs from the current design ("baseline 2: Demo wheel — rim
 * 30 mm, cover 0 at the rim").
 */
export function baselineLabel(b: CaseFile, design: CaseFile, index: number, reference: boolean): string {
  const raw = b.name ?? 'unnamed';
  const name = raw.length > NAME_CHARS ? `${raw.slice(0, NAME_CHARS - 1)}…` : raw;
  return `baseline ${index + 1}${reference ? ' (reference)' : ''}: ${name} — ${caseDifferences(b, design, 2)}`;
}

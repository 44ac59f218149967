/** A study in one line for the captions of its exports: designs evaluated, the objective, the limits. */
import type { StudyDocument } from '../../compute/design/index';
import { headerText } from './studyRows';

export function studyCaptionLine(doc: StudyDocument): string {
  const limits = doc.limits.map((l) => `${l.label} ≤ ${l.max} ${l.unit}`).join(', ');
  return `Study: ${doc.designs.length} designs; objective ${headerText(doc.objective.label, doc.objective.unit)} minimised; ${limits ? `limits ${limits}` : 'no limits'}`;
}

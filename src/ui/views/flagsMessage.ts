/** The warning that some points of the current design are outside the model's validity range. */
import { FLAG_MESSAGES } from '../../compute/study/modelResults';
import type { Messages } from '../messages';
import { allPoints, type PageResults } from './pageResults';

export function renderFlags(messages: Messages, r: PageResults): void {
  const flags = new Set<string>();
  for (const p of allPoints(r)) for (const f of p.flags) flags.add(f);
  if (flags.size === 0) {
    messages.clear('flags');
    return;
  }
  messages.show(
    'warning',
    'Some points of this design are outside the model’s validity range (flagged in the tables):',
    [...flags].map((f) => FLAG_MESSAGES[f] ?? f),
    'flags',
  );
}

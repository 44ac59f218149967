/** One export button: runs its export on click and reports a failure through the page's messages. */
import { reportExportError } from './exportContext';

export function exportButton(
  text: string,
  label: string,
  run: () => Promise<void> | void,
): HTMLButtonElement {
  const b = document.createElement('button');
  b.type = 'button';
  b.textContent = text;
  b.setAttribute('aria-label', label);
  b.addEventListener('click', () => {
    try {
      Promise.resolve(run()).catch((e: unknown) => reportExportError(`${text} export failed`, e));
    } catch (e) {
      reportExportError(`${text} export failed`, e);
    }
  });
  return b;
}

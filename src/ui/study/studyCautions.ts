/** The ride's cautions as a block beside every view showing handling figures or limits. */
import { RIDE_CAUTIONS } from '../../compute/ride/index';
import { el } from '../dom';

export function studyCautions(cautions: readonly string[] = RIDE_CAUTIONS): HTMLElement {
  return el('div', { className: 'caution small', attrs: { role: 'note' } }, [
    el('strong', { text: 'Handling caution. ' }),
    cautions.join(' '),
  ]);
}

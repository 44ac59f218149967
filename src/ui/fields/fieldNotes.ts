/**
 * What the control panel adds to a lil-gui controller: its help (hover text and, for the model's own
 * terms, a short visible hint) and a note beside it for a rule or a refused value.
 */
import type { Controller } from 'lil-gui';
import type { Field } from './fieldTypes';

/** Hover text on the whole control and a small hint line under it, when the field has them. */
export function addFieldHelp(controller: Controller, field: Field): void {
  if (field.help) {
    controller.domElement.title = field.help;
    controller.$name.title = field.help;
  }
  if (field.hint) {
    const hint = document.createElement('div');
    hint.className = 'cs-hint';
    hint.textContent = field.hint;
    controller.domElement.classList.add('cs-has-note');
    controller.domElement.append(hint);
  }
}

export interface RuleNote {
  /** Show a rule ('typing': the text typed breaks it) or a refusal ('refused': nothing was applied). */
  show(text: string, kind: 'typing' | 'refused'): void;
  clear(): void;
}

/** The note beside a control (hidden until a rule is broken), announced to screen readers. */
export function ruleNote(controller: Controller, key: string): RuleNote {
  const note = document.createElement('div');
  note.className = 'cs-rule';
  note.id = `rule-${key}`;
  note.setAttribute('role', 'status');
  note.setAttribute('aria-live', 'polite');
  note.hidden = true;
  controller.domElement.classList.add('cs-has-note');
  controller.domElement.append(note);
  const input = controller.domElement.querySelector('input, select');
  return {
    show(text, kind) {
      note.textContent = text;
      note.dataset.kind = kind;
      note.hidden = false;
      controller.domElement.dataset.rule = kind;
      input?.setAttribute('aria-invalid', 'true');
      input?.setAttribute('aria-describedby', note.id);
    },
    clear() {
      if (note.hidden) return;
      note.hidden = true;
      note.textContent = '';
      delete controller.domElement.dataset.rule;
      input?.removeAttribute('aria-invalid');
      input?.removeAttribute('aria-describedby');
    },
  };
}

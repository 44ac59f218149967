/**
 * The control panel: lil-gui folders built from FIELDS. A change is turned into a new raw case or view
 * by the field's `set`, and handed to `onEdit`, which validates and applies it or returns why not.
 * A typed number is checked against its field's rule (checkTypedNumber) before anything is applied:
 * nothing is clamped or snapped behind the user's back. A refused value leaves the design as it was;
 * the rule is shown beside the control and the control shows the design's value again.
 * refresh() shows the state's values, labels (units) and which fields apply.
 */
import GUI, { type Controller } from 'lil-gui';
import { FIELDS, type Field, type FieldContext, type FieldValue, GROUP_TITLES, type GroupId } from './fields';
import { checkTypedNumber } from './fields/checkTypedNumber';
import { addFieldHelp, ruleNote } from './fields/fieldNotes';
import { labelParts, withUnit } from './fields/labelParts';
import { speakLabels } from './fields/speakLabels';

/** Validate and apply an edit; return the reasons when it is refused (nothing is applied then). */
/** `settled`: the edit is complete (a typed entry committed, a choice, a checkbox), not a step of a drag. */
export type EditHandler = (
  field: Field,
  value: FieldValue,
  settled: boolean,
) => readonly string[] | null | undefined;

const OPEN_GROUPS: readonly GroupId[] = ['wheel', 'spokes', 'cover', 'conditions'];

interface Entry {
  field: Field;
  controller: Controller;
  note: ReturnType<typeof ruleNote>;
}

export class Controls {
  readonly gui: GUI;
  private readonly form: Record<string, FieldValue> = {};
  private readonly controllers = new Map<string, Entry>();
  private refreshing = false;
  private ctx: FieldContext;

  constructor(
    container: HTMLElement,
    ctx: FieldContext,
    private readonly onEdit: EditHandler,
  ) {
    this.ctx = ctx;
    // Styles come from lil-gui's stylesheet (imported by styles.css): an injected <style> would break the
    // page's Content-Security-Policy (style-src 'self'). The page's theme sets its CSS variables.
    this.gui = new GUI({ container, title: 'Design controls', width: 300, injectStyles: false });
    this.gui.domElement.style.width = '100%';
    this.gui.domElement.classList.add('cs-theme');
    const folders = new Map<GroupId, GUI>();
    for (const field of FIELDS) {
      let folder = folders.get(field.group);
      if (!folder) {
        folder = this.gui.addFolder(GROUP_TITLES[field.group]);
        folder.domElement.dataset.group = field.group;
        if (!OPEN_GROUPS.includes(field.group)) folder.close();
        folders.set(field.group, folder);
      }
      this.form[field.key] = field.get(ctx);
      let controller: Controller;
      if (field.control === 'number') {
        // min/max/step give lil-gui's slider, arrow keys and drag their range; typed text is checked here.
        controller = folder.add(this.form, field.key, field.min, field.max, field.step);
      } else if (field.control === 'select') {
        controller = folder.add(this.form, field.key, field.options ?? {});
      } else {
        controller = folder.add(this.form, field.key);
      }
      controller.name(field.label(ctx));
      controller.domElement.dataset.field = field.key;
      addFieldHelp(controller, field);
      const entry: Entry = { field, controller, note: ruleNote(controller, field.key) };
      const fire = (v: FieldValue) => {
        if (!this.refreshing) this.edit(entry, v, field.control !== 'number');
      };
      // Text fields apply when finished (a half-typed list is not an edit); the rest on every change
      // (slider, arrow keys, drag, select, checkbox). Typed numbers are taken over by watchTyping.
      if (field.control === 'text') controller.onFinishChange(fire);
      else controller.onChange(fire);
      if (field.control === 'number') this.watchTyping(entry);
      this.controllers.set(field.key, entry);
    }
    if (window.matchMedia?.('(max-width: 900px)').matches) this.gui.close();
  }

  /**
   * A number typed into a control: lil-gui would snap and clamp it on every keystroke and apply it.
   * Instead the keystrokes only check the text (the rule shows while typing), and the value is applied,
   * exactly as typed, when the entry is finished (Enter or leaving the box), or refused with its rule.
   */
  private watchTyping(entry: Entry): void {
    const { controller, field } = entry;
    const input = controller.domElement.querySelector('input');
    if (!input) return;
    // A capturing listener on the widget runs before lil-gui's own listener on the input and stops it.
    controller.$widget.addEventListener(
      'input',
      (e) => {
        if (e.target !== input) return;
        e.stopPropagation();
        const check = checkTypedNumber(field, input.value, this.ctx);
        if (check.ok) entry.note.clear();
        else entry.note.show(check.rule, 'typing');
      },
      true,
    );
    input.addEventListener('change', () => {
      const check = checkTypedNumber(field, input.value, this.ctx);
      if (!check.ok) {
        this.refuse(entry, [check.rule]);
        return;
      }
      if (check.value === this.form[field.key]) {
        entry.note.clear();
        return;
      }
      this.form[field.key] = check.value;
      this.edit(entry, check.value, true);
    });
  }

  /** Hand an edit to the page; a refusal is shown beside the control and the control restored. */
  private edit(entry: Entry, value: FieldValue, settled: boolean): void {
    const refused = this.onEdit(entry.field, value, settled);
    if (refused && refused.length > 0) this.refuse(entry, refused);
    else entry.note.clear();
  }

  private refuse(entry: Entry, reasons: readonly string[]): void {
    const { field } = entry;
    const spoken = reasons.map((r) => speakLabels(r, FIELDS, this.ctx)).join('; ');
    const kept =
      field.control === 'number'
        ? withUnit(Number(field.get(this.ctx)), labelParts(field.label(this.ctx)).unit)
        : null;
    const keeps = kept === null ? 'The design is unchanged.' : `The design keeps ${kept}.`;
    entry.note.show(`Not applied: ${spoken}. ${keeps}`, 'refused');
    this.revert(field.key, this.ctx);
  }

  /** Show the state: values (except in the control being typed into), labels and applicability. */
  refresh(ctx: FieldContext): void {
    this.ctx = ctx;
    this.refreshing = true;
    try {
      for (const { field, controller, note } of this.controllers.values()) {
        const focused = controller.domElement.contains(document.activeElement);
        const value = field.get(ctx);
        if (!focused && this.form[field.key] !== value) {
          this.form[field.key] = value;
          controller.updateDisplay();
          // The design's value changed (another control, a reset, an opened file): an old refusal is moot.
          note.clear();
        }
        controller.name(field.label(ctx));
        controller.show(field.visible ? field.visible(ctx) : true);
      }
    } finally {
      this.refreshing = false;
    }
  }

  /** Put one control back to the state's value (after a rejected edit the user has seen). */
  revert(key: string, ctx: FieldContext): void {
    const entry = this.controllers.get(key);
    if (!entry) return;
    this.refreshing = true;
    this.form[key] = entry.field.get(ctx);
    entry.controller.updateDisplay();
    // lil-gui leaves a focused box's text alone; a refused entry is replaced now, focused or not.
    const input = entry.controller.domElement.querySelector('input');
    if (input && entry.field.control !== 'bool') input.value = String(this.form[key]);
    this.refreshing = false;
  }
}

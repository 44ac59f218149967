/**
 * The control panel: lil-gui folders built from FIELDS. A change is turned into a new raw case or view
 * by the field's `set`, and handed to `onEdit`, which validates and applies it (or reports why not).
 * refresh() shows the state's values, labels (units) and which fields apply.
 */
import GUI, { type Controller } from 'lil-gui';
import { FIELDS, type Field, type FieldContext, type FieldValue, GROUP_TITLES, type GroupId } from './fields';

export type EditHandler = (field: Field, value: FieldValue) => void;

const OPEN_GROUPS: readonly GroupId[] = ['wheel', 'spokes', 'cover', 'conditions'];

export class Controls {
  readonly gui: GUI;
  private readonly form: Record<string, FieldValue> = {};
  private readonly controllers = new Map<string, { field: Field; controller: Controller }>();
  private refreshing = false;

  constructor(container: HTMLElement, ctx: FieldContext, onEdit: EditHandler) {
    // Styles come from lil-gui's stylesheet (imported by styles.css): an injected <style> would break the
    // page's Content-Security-Policy (style-src 'self').
    this.gui = new GUI({ container, title: 'Design controls', width: 300, injectStyles: false });
    this.gui.domElement.style.width = '100%';
    const folders = new Map<GroupId, GUI>();
    for (const field of FIELDS) {
      let folder = folders.get(field.group);
      if (!folder) {
        folder = this.gui.addFolder(GROUP_TITLES[field.group]);
        if (!OPEN_GROUPS.includes(field.group)) folder.close();
        folders.set(field.group, folder);
      }
      this.form[field.key] = field.get(ctx);
      let controller: Controller;
      if (field.control === 'number') {
        controller = folder.add(this.form, field.key, field.min, field.max, field.step);
      } else if (field.control === 'select') {
        controller = folder.add(this.form, field.key, field.options ?? {});
      } else {
        controller = folder.add(this.form, field.key);
      }
      controller.name(field.label(ctx));
      controller.domElement.dataset.field = field.key;
      const fire = (v: FieldValue) => {
        if (!this.refreshing) onEdit(field, v);
      };
      // Text fields apply when finished (a half-typed list is not an edit); the rest on every change.
      if (field.control === 'text') controller.onFinishChange(fire);
      else controller.onChange(fire);
      this.controllers.set(field.key, { field, controller });
    }
    if (window.matchMedia?.('(max-width: 900px)').matches) this.gui.close();
  }

  /** Show the state: values (except in the control being typed into), labels and applicability. */
  refresh(ctx: FieldContext): void {
    this.refreshing = true;
    try {
      for (const { field, controller } of this.controllers.values()) {
        const focused = controller.domElement.contains(document.activeElement);
        const value = field.get(ctx);
        if (!focused && this.form[field.key] !== value) {
          this.form[field.key] = value;
          controller.updateDisplay();
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
    this.refreshing = false;
  }
}

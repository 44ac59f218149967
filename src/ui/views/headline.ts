/** The headline figures: the current design's key numbers at 0 and 10 degrees of yaw, with the baseline's. */
import { fixed, fmt, speedFromMps, speedUnitText, toDisplay, unitText } from '../displayUnits';
import { OUTPUTS, type OutputSpec } from '../outputs';
import { casePoints, mainPoints, type PageResults } from './pageResults';
import { display, type Present } from './present';

function nearestIndex(values: readonly number[], target: number): number {
  let best = 0;
  for (let i = 1; i < values.length; i++) {
    if (Math.abs(values[i]! - target) < Math.abs(values[best]! - target)) best = i;
  }
  return best;
}

export function renderHeadline(box: HTMLElement, ctx: Present, r: PageResults): void {
  const u = ctx.units;
  const pts = mainPoints(r);
  const yaws = ctx.state.case.conditions.yaw_deg;
  const i0 = nearestIndex(yaws, 0);
  const i10 = nearestIndex(yaws, 10);
  const base = r.baseline ? casePoints(r.baseline.curve) : null;
  const cards: Array<{ label: string; spec: OutputSpec; i: number; extra?: string }> = [];
  const p0 = pts[i0]!;
  const gfRef = toDisplay(p0.axialN, 'force', { ...u, force: 'gf' }, p0);
  cards.push({
    label: `Axial drag at ${fmt(yaws[i0]!)}° yaw`,
    spec: OUTPUTS.axial,
    i: i0,
    extra:
      u.force === 'N'
        ? `${fixed(gfRef, 0)} gf at ${fmt(speedFromMps(u.referenceSpeedMps, u.speed), 3)} ${speedUnitText(u.speed)}`
        : `${fixed(p0.axialN, 3)} N at the airspeed`,
  });
  cards.push({ label: `Axial drag at ${fmt(yaws[i10]!)}° yaw`, spec: OUTPUTS.axial, i: i10 });
  cards.push({ label: `Side force at ${fmt(yaws[i10]!)}° yaw`, spec: OUTPUTS.side, i: i10 });
  cards.push({ label: `Steering moment at ${fmt(yaws[i10]!)}°`, spec: OUTPUTS.steering, i: i10 });
  cards.push({ label: `Power at ${fmt(yaws[i0]!)}° (one wheel)`, spec: OUTPUTS.power, i: i0 });
  cards.push({ label: `Drag area at ${fmt(yaws[i0]!)}° yaw`, spec: OUTPUTS.cda, i: i0 });
  const frag = document.createDocumentFragment();
  for (const c of cards) {
    const p = pts[c.i]!;
    const card = document.createElement('div');
    card.className = 'figure-card';
    const label = document.createElement('div');
    label.className = 'label';
    label.textContent = c.label;
    const value = document.createElement('div');
    value.className = 'value';
    const decimals = c.spec.kind === 'force' ? (u.force === 'N' ? 3 : 0) : c.spec.kind === 'moment' ? 3 : 2;
    value.textContent = `${fixed(display(ctx, c.spec, p), decimals)} ${unitText(c.spec.kind, u)}`;
    card.append(label, value);
    const subs: string[] = [];
    if (c.extra) subs.push(c.extra);
    if (c.spec.key === 'axial' && p.uncertaintyAxialN > 0) {
      subs.push(`lattice ± ${fixed(toDisplay(p.uncertaintyAxialN, 'force', u, p), u.force === 'N' ? 3 : 1)}`);
    }
    if (c.spec.key === 'side' && p.uncertaintySideN > 0) {
      subs.push(`lattice ± ${fixed(toDisplay(p.uncertaintySideN, 'force', u, p), u.force === 'N' ? 3 : 1)}`);
    }
    if (subs.length > 0) {
      const sub = document.createElement('div');
      sub.className = 'sub';
      sub.textContent = subs.join(' · ');
      card.append(sub);
    }
    const b = base?.[c.i];
    if (b) {
      const delta = document.createElement('div');
      delta.className = 'delta';
      const d = display(ctx, c.spec, p) - display(ctx, c.spec, b);
      const pct = (100 * (c.spec.get(p) - c.spec.get(b))) / Math.abs(c.spec.get(b));
      const parts = [`${d >= 0 ? '+' : ''}${fixed(d, decimals)} ${unitText(c.spec.kind, u)}`];
      if (Number.isFinite(pct)) parts.push(`${pct >= 0 ? '+' : ''}${fixed(pct, 1)} %`);
      if (c.spec.key === 'axial')
        parts.push(`${p.powerW - b.powerW >= 0 ? '+' : ''}${fixed(p.powerW - b.powerW, 2)} W`);
      delta.textContent = `vs ${ctx.state.baselines ? 'reference ' : ''}baseline: ${parts.join(', ')}`;
      card.append(delta);
    }
    frag.append(card);
  }
  box.replaceChildren(frag);
}

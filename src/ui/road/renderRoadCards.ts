/** The road panel's headline cards: watts, seconds, grams, aero share, yaw, lean, gust impulse, trail. */
import type { RideDocument } from '../../compute/ride/index';
import { dragAreaToGramsForce } from '../../compute/units';
import { fixed, fmt, speedFromMps, speedUnitText } from '../displayUnits';
import { el } from '../dom';
import type { RoadContext } from './roadContext';

export function renderRoadCards(cardsEl: HTMLElement, d: RideDocument, ctx: RoadContext): void {
  const u = ctx.speedUnit;
  const su = speedUnitText(u);
  const sign = (x: number, decimals: number) => `${x > 0 ? '+' : ''}${fixed(x, decimals)}`;
  const rho = d.air_density_kgpm3 ?? Number.NaN;
  const grams = (cda: number | null) =>
    cda === null ? Number.NaN : dragAreaToGramsForce(cda, ctx.referenceSpeedMps, rho);
  const gD = grams(d.wind_averaged_cda_m2.design);
  const gB = grams(d.wind_averaged_cda_m2.baseline);
  const refText = `${fmt(speedFromMps(ctx.referenceSpeedMps, u), 3)} ${su}`;
  const speedText = `${fixed(speedFromMps(d.constant_speed_mps ?? Number.NaN, u), 1)} ${su}`;
  const dist = `${fmt(d.distance_m / 1000, 4)} km`;
  const share = (x: number | null) => (x === null ? Number.NaN : 100 * x);
  const cards: Array<{ id: string; label: string; value: string; sub: string[] }> = [
    {
      id: 'power',
      label: `Power at ${speedText} (constant speed)`,
      value: `${sign(d.delta_power_W ?? Number.NaN, 1)} W`,
      sub: [
        `design ${fixed(d.power_W.design ?? Number.NaN, 1)} W, baseline ${fixed(d.power_W.baseline ?? Number.NaN, 1)} W`,
      ],
    },
    {
      id: 'time',
      label: `Time over ${dist} at ${fixed(d.constant_power_W ?? Number.NaN, 0)} W`,
      value: `${sign(d.delta_time_s ?? Number.NaN, 1)} s`,
      sub: [
        `design ${clock(d.time_s.design)}, baseline ${clock(d.time_s.baseline)}`,
        `mean speed ${sign(speedFromMps(d.delta_speed_mps ?? Number.NaN, u), 2)} ${su}`,
      ],
    },
    {
      id: 'grams',
      label: `Wind-averaged axial drag, grams at ${refText}`,
      value: `${sign(gD - gB, 0)} g`,
      sub: [
        `design ${fixed(gD, 0)} g, baseline ${fixed(gB, 0)} g`,
        `${fixed(d.wind_averaged_axial_N.design ?? Number.NaN, 3)} N vs ${fixed(d.wind_averaged_axial_N.baseline ?? Number.NaN, 3)} N at ${speedText}`,
      ],
    },
    {
      id: 'aero',
      label: 'Aerodynamic share of the power',
      value: `${fixed(share(d.aero_share.design), 1)} %`,
      sub: [`baseline ${fixed(share(d.aero_share.baseline), 1)} % (rider, bike and wheel)`],
    },
    {
      id: 'yaw',
      label: 'Yaw at the wheel',
      value: `90 % below ${fixed(d.yaw_p90_deg ?? Number.NaN, 1)}°`,
      sub: [`mean ${fixed(d.yaw_mean_deg ?? Number.NaN, 1)}°`],
    },
    {
      id: 'lean',
      label: `Lean to hold a ${fmt(d.gust.factor, 3)}× gust`,
      value: `${fixed(d.lean_deg.design ?? Number.NaN, 2)}°`,
      sub: [
        `baseline ${fixed(d.lean_deg.baseline ?? Number.NaN, 2)}°; gust ${fixed(d.gust.hub_speed_mps ?? Number.NaN, 1)} m/s at the hub`,
      ],
    },
    {
      id: 'impulse',
      label: `Gust impulse (${fmt(d.gust.duration_s, 3)} s)`,
      value: `${fixed(d.gust_impulse_Ns.design ?? Number.NaN, 2)} N s`,
      sub: [
        `baseline ${fixed(d.gust_impulse_Ns.baseline ?? Number.NaN, 2)} N s; sideways ${fixed(d.gust_lateral_speed_change_mps.design ?? Number.NaN, 3)} m/s`,
      ],
    },
    {
      id: 'trail',
      label: 'Trail (head angle, offset, radius)',
      value: `${fixed((d.trail_m.design ?? Number.NaN) * 1000, 1)} mm`,
      sub: [`baseline ${fixed((d.trail_m.baseline ?? Number.NaN) * 1000, 1)} mm`],
    },
  ];
  cardsEl.replaceChildren(
    ...cards.map((c) =>
      el('div', { className: 'figure-card', attrs: { 'data-card': c.id } }, [
        el('div', { className: 'label', text: c.label }),
        el('div', { className: 'value', text: c.value }),
        ...c.sub.map((s) => el('div', { className: 'sub', text: s })),
      ]),
    ),
  );
}

/** Seconds as h:mm:ss. */
function clock(s: number | null): string {
  if (s === null || !Number.isFinite(s)) return '—';
  const t = Math.round(s);
  const h = Math.floor(t / 3600);
  const m = Math.floor((t % 3600) / 60);
  const sec = t % 60;
  return `${h}:${String(m).padStart(2, '0')}:${String(sec).padStart(2, '0')}`;
}

import { fixed, figure } from '@/app/_components/sizing-result/quantity-format';
import { parseNumeric } from '@/lib/engine/schema-fields';
import {
  STANDARD_FLOW_BASES,
  flowToKgPerS,
  isGaugePressureUnit,
  pressureToPa,
  type StandardFlowUnit,
} from '@/lib/units';
import type { FlowContext } from '@/lib/units';
import type { QtyText } from './form-types';

/** What a pressure field means: the absolute value of a gauge reading against the site, or "absolute". */
export function pressureHint(q: QtyText, barometricPa: number): string {
  let gauge: boolean;
  try {
    gauge = isGaugePressureUnit(q.unit);
  } catch {
    return '';
  }
  const site = `site ${fixed(barometricPa / 1000, 3)} kPa`;
  const v = parseNumeric(q.value);
  if (!gauge) return 'Absolute pressure.';
  if (!Number.isFinite(v)) return `Gauge, above the ${site}.`;
  return `Gauge: ${fixed(pressureToPa(v, q.unit, barometricPa) / 1000, 3)} kPa abs with the ${site}.`;
}

/** What a flow unit means: the reference state of standard volumes, the state of actual volumes, the mass. */
export function flowHint(q: QtyText, ctx: FlowContext | null): string {
  const basis = STANDARD_FLOW_BASES[q.unit as StandardFlowUnit];
  const v = parseNumeric(q.value);
  let mass = '';
  if (Number.isFinite(v) && v > 0 && q.unit !== 'kg/h') {
    try {
      mass = ` = ${figure(flowToKgPerS(v, q.unit, ctx ?? undefined) * 3600)} kg/h`;
    } catch {
      mass = '';
    }
  }
  if (basis) return `Standard volume at ${basis.description}${mass}.`;
  if (q.unit === 'm3/h' || q.unit === 'ACFM') return `Actual volume at the inlet temperature and pressure${mass}.`;
  return `Mass flow${mass}.`;
}

/** "Ratio 3.04 per stage (overall 28.2)" while both pressures are readable and discharge is above suction. */
export function stageRatioHint(
  suction: QtyText,
  discharge: QtyText,
  stagesText: string,
  dropPercentText: string,
  barometricPa: number,
): string {
  const p1 = parseNumeric(suction.value);
  const p2 = parseNumeric(discharge.value);
  const n = Number(stagesText);
  const drop = parseNumeric(dropPercentText);
  try {
    const a = pressureToPa(p1, suction.unit, barometricPa);
    const b = pressureToPa(p2, discharge.unit, barometricPa);
    if (!(a > 0 && b > a && n >= 1 && Number.isFinite(drop))) return 'Equal pressure ratio in every stage.';
    const r = Math.pow(b / (a * Math.pow(1 - drop / 100, n - 1)), 1 / n);
    return `Ratio ${fixed(r, 3)} per stage (overall ${fixed(b / a, 2)}); equal ratio in every stage.`;
  } catch {
    return 'Equal pressure ratio in every stage.';
  }
}

/** "Rise 305.0 K" while both temperatures are readable. */
export function riseHint(inlet: QtyText, outlet: QtyText, toK: (v: number, unit: string) => number): string {
  const a = parseNumeric(inlet.value);
  const b = parseNumeric(outlet.value);
  try {
    if (!Number.isFinite(a) || !Number.isFinite(b)) return 'Gas temperature leaving the heater.';
    const rise = toK(b, outlet.unit) - toK(a, inlet.unit);
    const flag = Math.abs(rise) > 200 ? ' (over 200 K: the average-cp shortcut is not used)' : '';
    return `Rise ${fixed(rise, 1)} K over the inlet${flag}.`;
  } catch {
    return 'Gas temperature leaving the heater.';
  }
}

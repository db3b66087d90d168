import type { FieldErrors, Resolver } from 'react-hook-form';
import type { DeskValues } from './form-types';
import { validateDesk } from './validate';

function setPath(target: Record<string, unknown>, path: string, leaf: unknown): void {
  const parts = path.split('.');
  let node = target;
  for (const part of parts.slice(0, -1)) node = (node[part] ??= {}) as Record<string, unknown>;
  node[parts[parts.length - 1]!] = leaf;
}

// Quantities register "<path>.value"; their issues land on that input.
const QUANTITY_KEYS = new Set([
  'site.barometricPressure',
  'gas.dewPoint',
  'flow',
  'inlet.temperature',
  'inlet.pressure',
  'outletTemperature',
  'dischargePressure',
  'intercoolerOutletTemperature',
  'dischargeTemperatureLimit',
]);

/** react-hook-form resolver built on the engine's request schema (via `validateDesk`). */
export const deskResolver: Resolver<DeskValues> = async (values) => {
  const v = validateDesk(values);
  if (v.ok) return { values, errors: {} };
  const errors: Record<string, unknown> = {};
  for (const [key, message] of Object.entries(v.issues.fields)) {
    setPath(errors, QUANTITY_KEYS.has(key) ? `${key}.value` : key, { type: 'engine', message });
  }
  if (v.issues.general.length) setPath(errors, 'root.engine', { type: 'engine', message: v.issues.general.join(' ') });
  return { values: {}, errors: errors as FieldErrors<DeskValues> };
};

import { ZERO_CELSIUS_K } from '../../thermo/constants';
import type { GasModel } from '../../thermo/gas-model';
import { classifyInlet, type InletClassification } from '../../thermo/phase';
import { SPECIES, type SpeciesId } from '../../thermo/species-data';
import type { SizingIssue } from '../input-error';
import { classifyHumidGas, isHumidLightGas } from './humid-gas';

// Classifying costs tens of microseconds (a stability test, a dew point); desks and batches repeat the same
// gas and inlet, so the answers are kept, keyed by gas and state. Bounded and cleared wholesale.
const MAX_ENTRIES = 2048;
const cache = new Map<string, InletClassification>();

/** The inlet's phase by Peng-Robinson (pure components against their vapour pressure, mixtures by stability). */
export function inletPhase(gas: GasModel, temperatureK: number, pressurePa: number): InletClassification {
  const key = `${gas.key}|${temperatureK}|${pressurePa}`;
  const hit = cache.get(key);
  if (hit) return hit;
  if (cache.size >= MAX_ENTRIES) cache.clear();
  const result = isHumidLightGas(gas, pressurePa)
    ? classifyHumidGas(gas, temperatureK, pressurePa)
    : classifyInlet(gas.moleFractions, temperatureK, pressurePa);
  cache.set(key, result);
  return result;
}

const c1 = (k: number) => `${(k - ZERO_CELSIUS_K).toFixed(1)} °C`;
const kpa = (pa: number) => `${Number((pa / 1000).toPrecision(4))} kPa`;

function gasName(gas: GasModel): string {
  const ids = Object.keys(gas.moleFractions) as SpeciesId[];
  return ids.length === 1 ? SPECIES[ids[0]!].name : 'the gas';
}

function refusal(gas: GasModel, c: InletClassification, t: number, p: number): string | null {
  const name = gasName(gas);
  const at = `at ${c1(t)} and ${kpa(p)}`;
  if (c.phase === 'liquid') {
    const sat = c.detail.saturationPressurePa;
    if (sat !== undefined) {
      return `${name} at ${c1(t)} is liquid above ${kpa(sat)}; the inlet is ${kpa(p)}: a liquid is never sized as a gas (lower the pressure below ${kpa(sat)} or raise the temperature)`;
    }
    const dew = c.detail.dewPointK;
    return `${name} is liquid ${at}${dew === undefined ? '' : ` (its dew point at this pressure is ${c1(dew)})`}: a liquid is never sized as a gas`;
  }
  if (c.phase === 'two-phase') {
    const liquid = (100 * (1 - c.detail.vapourFraction)).toPrecision(3);
    const dew = c.detail.dewPointK;
    const dewP = c.detail.dewPressurePa;
    const fix = [
      dew === undefined ? null : `heat it above its dew point of ${c1(dew)}`,
      dewP === undefined ? null : `lower the pressure below ${kpa(dewP)}`,
    ]
      .filter(Boolean)
      .join(' or ');
    return `${name} is two-phase ${at} (${liquid} mol % liquid): only a gas can be sized${fix ? `; ${fix}` : ''}`;
  }
  return null;
}

/**
 * Refuses a liquid or two-phase inlet with an issue on inlet.pressure saying why (whatever equation of state
 * was asked for, ideal gas included); returns the classification, or null when refused.
 */
export function checkInletPhase(
  gas: GasModel,
  temperatureK: number,
  pressurePa: number,
  issues: SizingIssue[],
): InletClassification | null {
  const c = inletPhase(gas, temperatureK, pressurePa);
  const message = refusal(gas, c, temperatureK, pressurePa);
  if (message === null) return c;
  issues.push({ path: 'inlet.pressure', message });
  return null;
}

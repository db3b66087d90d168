import type { GasModel } from '../thermo/gas-model';
import type { SpeciesId } from '../thermo/species-data';
import type { SizingWarning } from './result-types';

const FLAMMABLE: readonly SpeciesId[] = [
  'CH4',
  'C2H6',
  'C3H8',
  'n-C4H10',
  'i-C4H10',
  'n-C5H12',
  'i-C5H12',
  'n-C6H14',
  'n-C7H16',
  'n-C8H18',
  'n-C9H20',
  'n-C10H22',
  'H2',
  'CO',
  'NH3',
  'H2S',
];
const TOXIC: readonly SpeciesId[] = ['CO', 'NH3', 'H2S'];
/** Flag fuels from 1 mol % [cp]; hydrogen likewise. */
const FUEL_THRESHOLD = 0.01;
/** Oxygen-enriched above 23.5 %, oxygen-deficient below 19.5 % [mem: common occupational-safety definitions]. */
const OXYGEN_ENRICHED = 0.235;
const OXYGEN_DEFICIENT = 0.195;

function percentList(gas: GasModel, ids: readonly SpeciesId[]): string {
  return ids
    .filter((id) => (gas.moleFractions[id] ?? 0) > 0)
    .map((id) => `${id} ${(100 * (gas.moleFractions[id] ?? 0)).toPrecision(3)} %`)
    .join(', ');
}

function total(gas: GasModel, ids: readonly SpeciesId[]): number {
  let sum = 0;
  for (const id of ids) sum += gas.moleFractions[id] ?? 0;
  return sum;
}

const flammable = new WeakMap<GasModel, boolean>();

/** True when the gas carries flammable components at or above 1 mol %. */
export function isFlammable(gas: GasModel): boolean {
  let hit = flammable.get(gas);
  if (hit === undefined) {
    hit = total(gas, FLAMMABLE) >= FUEL_THRESHOLD;
    flammable.set(gas, hit);
  }
  return hit;
}

// Gases are compiled once and cached, so their composition cautions are too (frozen: results share them).
const cache = new WeakMap<GasModel, readonly SizingWarning[]>();

/** Cautions that follow from the composition alone. */
export function gasWarnings(gas: GasModel): readonly SizingWarning[] {
  let hit = cache.get(gas);
  if (!hit) {
    hit = Object.freeze(buildGasWarnings(gas).map((w) => Object.freeze(w)));
    cache.set(gas, hit);
  }
  return hit;
}

function buildGasWarnings(gas: GasModel): SizingWarning[] {
  const out: SizingWarning[] = [];
  const o2 = gas.moleFractions.O2 ?? 0;
  const h2 = gas.moleFractions.H2 ?? 0;
  if (isFlammable(gas)) {
    out.push({
      code: 'flammable-gas',
      severity: 'danger',
      message:
        `Flammable gas (${percentList(gas, FLAMMABLE)}): the installation is normally in a classified hazardous area; ` +
        'equipment, purging, venting and relief must suit it under local codes.',
    });
    if (o2 >= FUEL_THRESHOLD) {
      out.push({
        code: 'fuel-oxidant-mixture',
        severity: 'danger',
        message: `Fuel and oxygen (O2 ${(100 * o2).toPrecision(3)} %) are present together: the gas may be within its flammable limits. Do not heat or compress it without a hazard review.`,
      });
    }
  }
  if (o2 > OXYGEN_ENRICHED) {
    out.push({
      code: 'oxygen-service',
      severity: 'danger',
      message:
        `Oxygen-enriched gas (O2 ${(100 * o2).toPrecision(3)} %): heat of compression, friction, particles and contamination (oil, grease) are ignition sources; ` +
        'materials, cleaning and velocities must suit oxygen service (ASTM G88) and lower discharge-temperature limits apply (EIGA practice).',
    });
  } else if (o2 < OXYGEN_DEFICIENT) {
    out.push({
      code: 'asphyxiation',
      severity: 'caution',
      message:
        'The gas is oxygen-deficient: a leak into an enclosed space can asphyxiate without warning. Ventilate and monitor oxygen.',
    });
  }
  if (h2 >= FUEL_THRESHOLD) {
    out.push({
      code: 'hydrogen',
      severity: 'warning',
      message:
        `Hydrogen (${(100 * h2).toPrecision(3)} %): wide flammable range, very low ignition energy, invisible flame, leaks easily and embrittles steels; ` +
        'piping to ASME B31.12 practice. Reciprocating compressors in hydrogen-rich service are limited to about 135 °C discharge (API 618).',
    });
  }
  if (total(gas, TOXIC) > 0) {
    out.push({
      code: 'toxic-gas',
      severity: 'warning',
      message: `Toxic component (${percentList(gas, TOXIC)}): leak detection, ventilation and safe venting are required.`,
    });
  }
  return out;
}

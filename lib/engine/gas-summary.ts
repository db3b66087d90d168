import { massFractionsOf } from '../thermo/composition';
import { DRY_AIR_SOURCE } from '../thermo/dry-air';
import type { GasModel } from '../thermo/gas-model';
import { GAS_PRESETS } from '../thermo/presets';
import { SPECIES_IDS } from '../thermo/species-data';
import { pseudoCritical } from './pseudo-critical';
import type { GasSummary } from './result-types';

// One summary per compiled gas (gases are cached), frozen because results share it.
const summaries = new WeakMap<GasModel, { summary: GasSummary; composition: string }>();

function compositionText(gas: GasModel): string {
  const parts = SPECIES_IDS.filter((id) => gas.moleFractions[id] !== undefined).map(
    (id) => `${id} ${Number((gas.moleFractions[id] ?? 0).toPrecision(6))}`,
  );
  const preset = GAS_PRESETS.find((p) => `preset:${p.id}` === gas.key);
  const source =
    preset?.id === 'air' || gas.key.startsWith('humid-')
      ? `; ${DRY_AIR_SOURCE}`
      : preset?.note
        ? `; ${preset.note}`
        : '';
  return `mole fractions ${parts.join(', ')}${source}`;
}

/** Composition, molar mass and pseudo-critical constants of a gas, plus its composition line for the basis. */
export function summarizeGas(gas: GasModel): { summary: GasSummary; composition: string } {
  const hit = summaries.get(gas);
  if (hit) return hit;
  const pc = pseudoCritical(gas);
  const entry = {
    summary: Object.freeze({
      label: gas.label,
      key: gas.key,
      moleFractions: Object.freeze({ ...gas.moleFractions }),
      massFractions: Object.freeze(massFractionsOf(gas.moleFractions)),
      molarMassKgPerKmol: gas.molarMassKgPerKmol,
      gasConstantJPerKgK: gas.gasConstantJPerKgK,
      pseudoCriticalTemperatureK: pc.tcK,
      pseudoCriticalPressureKpa: pc.pcPa / 1000,
    }),
    composition: compositionText(gas),
  };
  summaries.set(gas, entry);
  return entry;
}

import { compositionKey, type MoleFractions } from './composition';
import { DRY_AIR_MOLE_FRACTIONS } from './dry-air';
import { cachedGas } from './gas-cache';
import type { GasModel } from './gas-model';
import { humidAirAt, type HumidAirState, type HumiditySpec } from './humid-air';

export type GasPreset = {
  readonly id: string;
  readonly displayName: string;
  /** Mole fractions; undefined for humid air, whose water content depends on the inlet state. */
  readonly moleFractions?: Readonly<MoleFractions>;
  readonly note?: string;
};

/** Gas presets for the form's picker, in display order. */
export const GAS_PRESETS: readonly GasPreset[] = [
  {
    id: 'air',
    displayName: 'Air (dry)',
    moleFractions: DRY_AIR_MOLE_FRACTIONS,
    note: 'U.S. Standard Atmosphere 1976 composition',
  },
  {
    id: 'humid-air',
    displayName: 'Air (humid)',
    note: 'dry air plus water vapour from relative humidity or dew point at the inlet',
  },
  { id: 'nitrogen', displayName: 'Nitrogen (N2)', moleFractions: { N2: 1 } },
  { id: 'oxygen', displayName: 'Oxygen (O2)', moleFractions: { O2: 1 } },
  { id: 'argon', displayName: 'Argon (Ar)', moleFractions: { Ar: 1 } },
  { id: 'helium', displayName: 'Helium (He)', moleFractions: { He: 1 } },
  { id: 'carbon-dioxide', displayName: 'Carbon dioxide (CO2)', moleFractions: { CO2: 1 } },
  {
    id: 'steam',
    displayName: 'Steam / water vapour (H2O)',
    moleFractions: { H2O: 1 },
    note: 'ideal-gas steam: superheated, low pressure only',
  },
  { id: 'hydrogen', displayName: 'Hydrogen (H2)', moleFractions: { H2: 1 } },
  { id: 'methane', displayName: 'Methane (CH4)', moleFractions: { CH4: 1 } },
  { id: 'ethane', displayName: 'Ethane (C2H6)', moleFractions: { C2H6: 1 } },
  { id: 'propane', displayName: 'Propane (C3H8)', moleFractions: { C3H8: 1 } },
  { id: 'carbon-monoxide', displayName: 'Carbon monoxide (CO)', moleFractions: { CO: 1 } },
  { id: 'ammonia', displayName: 'Ammonia (NH3)', moleFractions: { NH3: 1 } },
  {
    id: 'natural-gas',
    displayName: 'Natural gas (typical lean example)',
    // An illustrative composition, not any particular supply: use the measured analysis for a quote.
    moleFractions: { CH4: 0.95, C2H6: 0.03, C3H8: 0.005, N2: 0.01, CO2: 0.005 },
    note: 'typical lean composition for illustration (CH4 0.95, C2H6 0.03, C3H8 0.005, N2 0.01, CO2 0.005); use the site gas analysis',
  },
  {
    id: 'natural-gas-rich',
    displayName: 'Natural gas (typical rich example, C4+)',
    // An illustrative composition with butanes to hexane, not any particular supply.
    moleFractions: {
      CH4: 0.885,
      C2H6: 0.055,
      C3H8: 0.02,
      'i-C4H10': 0.004,
      'n-C4H10': 0.005,
      'i-C5H12': 0.0015,
      'n-C5H12': 0.0012,
      'n-C6H14': 0.0008,
      N2: 0.015,
      CO2: 0.0125,
    },
    note: 'typical rich composition for illustration (CH4 0.885, C2H6 0.055, C3H8 0.02, C4 0.009, C5 0.0027, C6 0.0008, N2 0.015, CO2 0.0125); heavier ends can condense when cooled or compressed; use the site gas analysis',
  },
];

/** Accepted alternative spellings of preset ids. */
export const PRESET_ALIASES: Readonly<Record<string, string>> = {
  'water-vapour': 'steam',
  'water-vapor': 'steam',
  'dry-air': 'air',
};

export const PRESET_IDS: readonly string[] = GAS_PRESETS.map((p) => p.id);

const BY_ID = new Map(GAS_PRESETS.map((p) => [p.id, p]));

/** The preset for an id or alias, or undefined. */
export function findPreset(id: string): GasPreset | undefined {
  return BY_ID.get(PRESET_ALIASES[id] ?? id);
}

/** The compiled gas of a fixed-composition preset (compiled once, then cached). */
export function presetGas(id: string): GasModel | undefined {
  const preset = findPreset(id);
  if (!preset?.moleFractions) return undefined;
  return cachedGas(`preset:${preset.id}`, preset.displayName, preset.moleFractions);
}

/** Compiled humid air at the inlet state, or the reason it cannot be built. */
export function humidAirGas(
  spec: HumiditySpec,
  temperatureK: number,
  pressurePa: number,
): { ok: true; gas: GasModel; state: Extract<HumidAirState, { ok: true }> } | Extract<HumidAirState, { ok: false }> {
  const state = humidAirAt(spec, temperatureK, pressurePa);
  if (!state.ok) return state;
  const percent = (100 * state.waterMoleFraction).toFixed(3);
  const gas = cachedGas(
    `humid-${compositionKey(state.moleFractions)}`,
    `Air (humid, H2O ${percent} mol %)`,
    state.moleFractions,
  );
  return { ok: true, gas, state };
}

/** Compiled gas for a user mixture of validated, normalised mole fractions. */
export function mixtureGas(moleFractions: MoleFractions, label = 'Mixture'): GasModel {
  return cachedGas(compositionKey(moleFractions), label, moleFractions);
}

import type { SizingInput } from '@/lib/engine';
import { speciesIdOf } from '@/lib/thermo/species-names';
import { standardAtmospherePressurePa, type UnitSystem } from '@/lib/units';
import { defaultValues } from './defaults';
import type { DeskValues, MixtureRow, QtyText } from './form-types';

const q = (x: { value: number; unit: string }): QtyText => ({ value: String(x.value), unit: x.unit });
const text = (n: number | undefined, fallback: string) => (n === undefined ? fallback : String(n));

// Request fields the desk has no input for: reopening drops them and says so.
const NOT_ON_DESK = ['k', 'cpJPerKgK', 'motorEfficiency', 'motorPowerFactor', 'aftercoolerOutletTemperature'] as const;

function gasValues(g: SizingInput['gas'], base: DeskValues['gas']): DeskValues['gas'] {
  if (g.components) {
    // The API also takes common names ("methane"); the desk's picker lists ids only.
    const components: MixtureRow[] = Object.entries(g.components).map(([species, x]) => ({
      species: speciesIdOf(species) ?? species,
      fraction: String(x),
    }));
    return { ...base, mode: 'mixture', basis: g.basis ?? 'mole', components };
  }
  const preset = g.preset ?? base.preset;
  if (g.dewPoint) return { ...base, mode: 'preset', preset, humidityBy: 'dew', dewPoint: q(g.dewPoint) };
  return {
    ...base,
    mode: 'preset',
    preset,
    humidityBy: 'rh',
    relativeHumidityPercent: text(g.relativeHumidityPercent, base.relativeHumidityPercent),
  };
}

function siteValue(site: SizingInput['site'], base: QtyText): QtyText {
  if (site?.barometricPressure) return q(site.barometricPressure);
  if (site?.altitudeM !== undefined) {
    return { value: String(Number((standardAtmospherePressurePa(site.altitudeM) / 1000).toFixed(3))), unit: 'kPa' };
  }
  // The engine read no site as the standard atmosphere.
  return base.unit === 'kPa' ? base : { value: '101.325', unit: 'kPa' };
}

/** The form for a validated request (a saved sizing, a shared link); fields the request lacks take defaults. */
export function valuesFromInput(input: SizingInput, system: UnitSystem): { values: DeskValues; dropped: string[] } {
  const base = defaultValues(system);
  const v: DeskValues = {
    ...base,
    service: input.service,
    gas: gasValues(input.gas, base.gas),
    equationOfState: input.equationOfState ?? 'auto',
    flow: q(input.flow),
    inlet: { temperature: q(input.inlet.temperature), pressure: q(input.inlet.pressure) },
    site: { barometricPressure: siteValue(input.site, base.site.barometricPressure) },
    // Without a supply the engine figures a heater on 400 V three-phase.
    supply: input.supply
      ? { voltageV: String(input.supply.voltageV), phases: input.supply.phases === 1 ? '1' : '3' }
      : { voltageV: '400', phases: '3' },
  };
  const dropped: string[] = [];
  if (input.service === 'heater') {
    v.outletTemperature = q(input.outletTemperature);
    v.heatLossPercent = String(input.heatLossPercent);
    v.designMarginPercent = String(input.designMarginPercent);
    v.heaterRatingsKw = input.heaterRatingsKw ? input.heaterRatingsKw.join(', ') : '';
    return { values: v, dropped };
  }
  v.dischargePressure = q(input.dischargePressure);
  v.stages = String(input.stages);
  v.efficiencyKind = input.isentropicEfficiency === undefined ? 'polytropic' : 'isentropic';
  v.efficiency = text(input.isentropicEfficiency ?? input.polytropicEfficiency, base.efficiency);
  v.intercoolerOutletTemperature = input.intercoolerOutletTemperature
    ? q(input.intercoolerOutletTemperature)
    : { value: '', unit: input.inlet.temperature.unit };
  v.interstagePressureDropPercent = String(input.interstagePressureDropPercent);
  v.mechanicalEfficiency = String(input.mechanicalEfficiency);
  v.method = input.method;
  v.dischargeTemperatureLimit = input.dischargeTemperatureLimit
    ? q(input.dischargeTemperatureLimit)
    : { value: '', unit: input.inlet.temperature.unit };
  for (const key of NOT_ON_DESK) if (input[key] !== undefined) dropped.push(key);
  return { values: v, dropped };
}

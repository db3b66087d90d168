import type { SizingRequest } from '@/lib/engine';
import type { DeskValues, QtyText } from './form-types';

type GasRequest = SizingRequest['gas'];
type Quantity = { value: string; unit: string };

const trimmed = (q: QtyText): Quantity => ({ value: q.value.trim(), unit: q.unit });
const blank = (text: string) => text.trim() === '';

function gasOf(g: DeskValues['gas']): GasRequest {
  if (g.mode === 'mixture') {
    const components: Record<string, string> = {};
    for (const row of g.components) {
      if (!row.species || blank(row.fraction)) continue;
      // A species listed twice is summed, as a pasted analysis would mean.
      const prior = components[row.species];
      components[row.species] =
        prior === undefined ? row.fraction.trim() : String(Number(prior) + Number(row.fraction));
    }
    return g.basis === 'mass' ? { components, basis: 'mass' } : { components };
  }
  if (g.preset !== 'humid-air') return { preset: g.preset };
  return g.humidityBy === 'dew'
    ? { preset: g.preset, dewPoint: trimmed(g.dewPoint) }
    : { preset: g.preset, relativeHumidityPercent: g.relativeHumidityPercent.trim() };
}

/** "10, 20 30;40" -> ["10", "20", "30", "40"]; blank -> undefined (the default catalogue). */
export function parseRatings(text: string): string[] | undefined {
  const parts = text.split(/[\s,;]+/).filter((p) => p !== '');
  return parts.length ? parts : undefined;
}

/** The calculate request the form describes, numbers still as typed: the engine schema parses them. */
export function toRequest(v: DeskValues): SizingRequest {
  const common = {
    gas: gasOf(v.gas),
    flow: trimmed(v.flow),
    inlet: { temperature: trimmed(v.inlet.temperature), pressure: trimmed(v.inlet.pressure) },
    site: { barometricPressure: trimmed(v.site.barometricPressure) },
    supply: { voltageV: v.supply.voltageV.trim(), phases: v.supply.phases },
    ...(v.equationOfState === 'auto' ? {} : { equationOfState: v.equationOfState }),
  };
  if (v.service === 'heater') {
    const ratings = parseRatings(v.heaterRatingsKw);
    return {
      service: 'heater',
      ...common,
      outletTemperature: trimmed(v.outletTemperature),
      heatLossPercent: v.heatLossPercent.trim(),
      designMarginPercent: v.designMarginPercent.trim(),
      ...(ratings ? { heaterRatingsKw: ratings } : {}),
    };
  }
  const efficiency = v.efficiency.trim();
  return {
    service: 'compressor',
    ...common,
    dischargePressure: trimmed(v.dischargePressure),
    stages: v.stages,
    ...(v.efficiencyKind === 'polytropic'
      ? { polytropicEfficiency: efficiency }
      : { isentropicEfficiency: efficiency }),
    ...(blank(v.intercoolerOutletTemperature.value)
      ? {}
      : { intercoolerOutletTemperature: trimmed(v.intercoolerOutletTemperature) }),
    interstagePressureDropPercent: v.interstagePressureDropPercent.trim(),
    mechanicalEfficiency: v.mechanicalEfficiency.trim(),
    method: v.method,
    ...(blank(v.dischargeTemperatureLimit.value)
      ? {}
      : { dischargeTemperatureLimit: trimmed(v.dischargeTemperatureLimit) }),
  };
}

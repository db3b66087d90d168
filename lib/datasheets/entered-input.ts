import { sizingRequestSchema, type SizingInput } from '@/lib/engine';

type Quantity = { value: number; unit: string };

/** The duty point as the user typed it (value and unit), for the "as entered" column. */
export type EnteredConditions = {
  flow: Quantity | null;
  inletTemperature: Quantity | null;
  inletPressure: Quantity | null;
  outletTemperature: Quantity | null;
  dischargePressure: Quantity | null;
  intercoolerOutletTemperature: Quantity | null;
  barometricPressure: Quantity | null;
  siteAltitudeM: number | null;
  isentropicEfficiency: number | null;
  polytropicEfficiency: number | null;
};

const none: EnteredConditions = {
  flow: null,
  inletTemperature: null,
  inletPressure: null,
  outletTemperature: null,
  dischargePressure: null,
  intercoolerOutletTemperature: null,
  barometricPressure: null,
  siteAltitudeM: null,
  isentropicEfficiency: null,
  polytropicEfficiency: null,
};

/**
 * Reads the saved request through the engine's own schema (numbers that arrived as text become numbers,
 * unit aliases become canonical). A request the schema no longer accepts prints the engine's figures only.
 */
export function enteredConditions(input: unknown): EnteredConditions {
  const parsed = sizingRequestSchema.safeParse(input);
  if (!parsed.success) return none;
  const i: SizingInput = parsed.data;
  const common = {
    ...none,
    flow: i.flow,
    inletTemperature: i.inlet.temperature,
    inletPressure: i.inlet.pressure,
    barometricPressure: i.site?.barometricPressure ?? null,
    siteAltitudeM: i.site?.altitudeM ?? null,
  };
  if (i.service === 'heater') return { ...common, outletTemperature: i.outletTemperature };
  return {
    ...common,
    dischargePressure: i.dischargePressure,
    intercoolerOutletTemperature: i.intercoolerOutletTemperature ?? null,
    isentropicEfficiency: i.isentropicEfficiency ?? null,
    polytropicEfficiency: i.polytropicEfficiency ?? null,
  };
}

import * as z from 'zod/mini';
import '@/lib/validation/english-messages';
import { checkComposition } from '../thermo/composition';
import { findPreset, PRESET_IDS } from '../thermo/presets';
import { ASHRAE_MAX_TEMPERATURE_K, ASHRAE_MIN_TEMPERATURE_K } from '../thermo/water-saturation';
import { ABSOLUTE_PRESSURE_UNITS, FLOW_UNITS, PRESSURE_UNITS, TEMPERATURE_UNITS } from '../units/unit-strings';
import { numberField, quantityField, temperatureField } from './schema-fields';

// Here rather than in ./compressor so that the desk's form, which parses with this schema in the browser, does not
// pull the compressor engine into its bundle.
/** Bearings, seals and gear [cp]. */
export const DEFAULT_MECHANICAL_EFFICIENCY = 0.98;

/** Ranges the schema enforces; the form shows the same figures. */
export const LIMITS = {
  heatLossPercent: { min: 0, max: 50 },
  designMarginPercent: { min: 0, max: 100 },
  interstagePressureDropPercent: { min: 0, max: 10 },
  stages: { min: 1, max: 6 },
  k: { min: 1, max: 1.8 },
  cpJPerKgK: { min: 100, max: 20_000 },
  voltageV: { min: 100, max: 35_000 },
  heaterRatingKw: { min: 0, max: 100_000 },
  siteAltitudeM: { min: -500, max: 6000 },
  // Real machines reach about 0.50-0.90 isentropic (small reciprocating to large centrifugal) and 0.70-0.90
  // polytropic [cp]; 1 is allowed as the reversible reference for hand checks, 0.30 catches a percentage typed
  // as a fraction's typo without refusing a poor machine.
  isentropicEfficiency: { min: 0.3, max: 1 },
  polytropicEfficiency: { min: 0.3, max: 1 },
  // Bearings, seals and gear lose a few per cent [cp]; below 0.5 the figure is not a mechanical efficiency.
  mechanicalEfficiency: { min: 0.5, max: 1 },
  motorEfficiency: { min: 0.5, max: 1 },
  motorPowerFactor: { min: 0.3, max: 1 },
  // A discharge-temperature limit between 40 °C and 350 °C: below, no compressor meets it; above, the
  // lubricants, seals and materials of process compressors are past their range [cp].
  dischargeTemperatureLimitK: { min: 313.15, max: 623.15 },
} as const;

/** The equations of state a request may ask for. */
export const EQUATIONS_OF_STATE = ['ideal-gas', 'peng-robinson', 'gerg-2008'] as const;

type IssueList = { code: 'custom'; path: string[]; message: string; input: unknown }[];

function addIssue(issues: unknown[], input: unknown, path: string[], message: string): void {
  (issues as IssueList).push({ code: 'custom', path, message, input });
}

const efficiency = (range: { min: number; max: number }, hint: string) =>
  numberField({ ...range, hint: `a fraction, e.g. 0.8 for 80 %; ${hint}` });

const temperature = temperatureField(TEMPERATURE_UNITS);
const pressure = quantityField(PRESSURE_UNITS, 'pressure');

const supply = z.strictObject({
  voltageV: numberField({ ...LIMITS.voltageV, unit: 'V', hint: 'line-to-line for three-phase' }),
  phases: z.pipe(
    z.union([z.literal(1), z.literal(3), z.literal('1'), z.literal('3')], { error: 'phases must be 1 or 3' }),
    z.transform((p) => (Number(p) === 1 ? 1 : 3) as 1 | 3),
  ),
});

const gas = z
  .strictObject({
    preset: z.optional(z.string({ error: 'preset must be a string' })),
    components: z.optional(z.record(z.string(), numberField({ min: 0, max: 1 }))),
    basis: z.optional(z.enum(['mole', 'mass'], { error: 'basis must be "mole" or "mass"' })),
    relativeHumidityPercent: z.optional(numberField({ min: 0, max: 100, unit: '%' })),
    dewPoint: z.optional(
      temperatureField(
        TEMPERATURE_UNITS,
        ASHRAE_MIN_TEMPERATURE_K,
        ASHRAE_MAX_TEMPERATURE_K,
        'the ASHRAE saturation-pressure range',
      ),
    ),
  })
  .check((ctx) => {
    const g = ctx.value;
    const push = addIssue.bind(null, ctx.issues, g);
    if ((g.preset === undefined) === (g.components === undefined)) {
      push([], 'give either "preset" or "components", not both and not neither');
      return;
    }
    const humid = g.preset !== undefined && findPreset(g.preset)?.id === 'humid-air';
    if (g.preset !== undefined && !findPreset(g.preset)) {
      push(['preset'], `unknown gas preset "${g.preset}" (allowed: ${PRESET_IDS.join(', ')})`);
    }
    if (humid && (g.relativeHumidityPercent === undefined) === (g.dewPoint === undefined)) {
      push(['relativeHumidityPercent'], 'humid air needs exactly one of relativeHumidityPercent or dewPoint');
    }
    if (!humid) {
      if (g.relativeHumidityPercent !== undefined)
        push(['relativeHumidityPercent'], 'only used with preset "humid-air"');
      if (g.dewPoint !== undefined) push(['dewPoint'], 'only used with preset "humid-air"');
    }
    if (g.basis !== undefined && g.components === undefined) push(['basis'], 'only used with "components"');
    if (g.components !== undefined) {
      const check = checkComposition(g.components, g.basis ?? 'mole');
      if (!check.ok)
        for (const issue of check.issues) push(['components', ...(issue.path ? [issue.path] : [])], issue.message);
    }
  });

const common = {
  gas,
  equationOfState: z.optional(
    z.enum(EQUATIONS_OF_STATE, {
      error:
        'equationOfState must be "ideal-gas", "peng-robinson" or "gerg-2008" (leave it out to let the engine choose)',
    }),
  ),
  flow: quantityField(FLOW_UNITS, 'flow', { min: 0, minExclusive: true }),
  inlet: z.strictObject({ temperature, pressure }),
  site: z.optional(
    z
      .strictObject({
        barometricPressure: z.optional(
          quantityField(ABSOLUTE_PRESSURE_UNITS, 'absolute pressure', { min: 0, minExclusive: true }),
        ),
        altitudeM: z.optional(numberField({ ...LIMITS.siteAltitudeM, unit: 'm' })),
      })
      .check((ctx) => {
        if (ctx.value.barometricPressure !== undefined && ctx.value.altitudeM !== undefined) {
          ctx.issues.push({
            code: 'custom',
            path: ['altitudeM'],
            message: 'give barometricPressure or altitudeM, not both',
            input: ctx.value,
          });
        }
      }),
  ),
};

const heater = z.strictObject({
  service: z.literal('heater'),
  ...common,
  outletTemperature: temperature,
  heatLossPercent: z._default(numberField({ ...LIMITS.heatLossPercent, unit: '%' }), 0),
  designMarginPercent: z._default(numberField({ ...LIMITS.designMarginPercent, unit: '%' }), 0),
  supply: z.optional(supply),
  heaterRatingsKw: z.optional(
    z
      .array(numberField({ ...LIMITS.heaterRatingKw, minExclusive: true, unit: 'kW' }), {
        error: 'must be a list of ratings in kW',
      })
      .check(z.minLength(1, { error: 'give at least one rating' }), z.maxLength(500, { error: 'at most 500 ratings' })),
  ),
});

const compressor = z
  .strictObject({
    service: z.literal('compressor'),
    ...common,
    dischargePressure: pressure,
    isentropicEfficiency: z.optional(
      efficiency(
        LIMITS.isentropicEfficiency,
        'isentropic (adiabatic) efficiency per stage; machines reach about 0.50-0.90, 1 is the reversible reference',
      ),
    ),
    polytropicEfficiency: z.optional(
      efficiency(
        LIMITS.polytropicEfficiency,
        'polytropic efficiency per stage; machines reach about 0.70-0.90, 1 is the reversible reference',
      ),
    ),
    stages: z._default(numberField({ ...LIMITS.stages, integer: true }), 1),
    intercoolerOutletTemperature: z.optional(temperature),
    aftercoolerOutletTemperature: z.optional(temperature),
    interstagePressureDropPercent: z._default(numberField({ ...LIMITS.interstagePressureDropPercent, unit: '%' }), 0),
    mechanicalEfficiency: z._default(
      efficiency(LIMITS.mechanicalEfficiency, 'mechanical (bearings, seals, gear)'),
      DEFAULT_MECHANICAL_EFFICIENCY,
    ),
    method: z._default(
      z.enum(['constant-k', 'variable-cp'], { error: 'method must be "constant-k" or "variable-cp"' }),
      'variable-cp',
    ),
    dischargeTemperatureLimit: z.optional(
      temperatureField(
        TEMPERATURE_UNITS,
        LIMITS.dischargeTemperatureLimitK.min,
        LIMITS.dischargeTemperatureLimitK.max,
        'the range of discharge-temperature limits for process compressors',
      ),
    ),
    k: z.optional(numberField({ ...LIMITS.k, minExclusive: true, hint: 'ratio of specific heats override' })),
    cpJPerKgK: z.optional(numberField({ ...LIMITS.cpJPerKgK, unit: 'J/(kg K)' })),
    motorEfficiency: z.optional(efficiency(LIMITS.motorEfficiency, 'motor efficiency at this load')),
    motorPowerFactor: z.optional(efficiency(LIMITS.motorPowerFactor, 'motor power factor at this load')),
    supply: z.optional(supply),
  })
  .check((ctx) => {
    const c = ctx.value;
    const both = c.isentropicEfficiency !== undefined && c.polytropicEfficiency !== undefined;
    const neither = c.isentropicEfficiency === undefined && c.polytropicEfficiency === undefined;
    if (neither || both) {
      ctx.issues.push({
        code: 'custom',
        path: [both ? 'polytropicEfficiency' : 'isentropicEfficiency'],
        message: `give exactly one of isentropicEfficiency or polytropicEfficiency (a fraction from ${LIMITS.isentropicEfficiency.min} to 1)`,
        input: c,
      });
    }
  });

/** The whole calculate request; shared by the form resolver and the API. */
export const sizingRequestSchema = z.discriminatedUnion('service', [heater, compressor], {
  error: 'service must be "heater" or "compressor"',
});

export const heaterRequestSchema = heater;
export const compressorRequestSchema = compressor;

/** What a client sends (numbers may be strings). */
export type SizingRequest = z.input<typeof sizingRequestSchema>;
/** A validated request: numbers coerced, units canonical, defaults filled. */
export type SizingInput = z.output<typeof sizingRequestSchema>;
export type HeaterInput = z.output<typeof heater>;
export type CompressorInput = z.output<typeof compressor>;
export type GasInput = z.output<typeof gas>;
export type QuantityInput<U extends string = string> = { value: number; unit: U };

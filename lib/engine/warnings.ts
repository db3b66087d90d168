import type { EquationOfStateId } from '../thermo/eos/types';
import type { GasModel } from '../thermo/gas-model';
import { SUBDIVISION_LIMIT_A } from './electrical';
import { gasWarnings, isFlammable } from './gas-warnings';
import type { CompressorCase } from './compressor';
import { headlineMethod } from './headline-method';
import type { GasState } from './pseudo-critical';
import { coolerWarnings, dewMarginWarning, equationWarnings } from './real-gas/equation-warnings';
import { compressorValidity, heaterValidity } from './real-gas/validity';
import type { ResolvedCommon } from './resolve';
import type { CompressorBlock, CompressorStage, HeaterBlock, SizingWarning } from './result-types';
import { bestTemperatureClass } from './temperature-class';

/** Average-cp estimate flagged beyond this temperature change [cp]. */
export const AVERAGE_CP_LIMIT_K = 200;
/** Stage ratios above this are flagged [cp]. */
export const HIGH_STAGE_RATIO = 4;
/** Surfaces above about 60 °C can burn on contact [cp]. */
const HOT_SURFACE_C = 60;
/** Pressure equipment rules generally start above 0.5 bar gauge [mem: EU PED 2014/68/EU art. 1]. */
const PRESSURE_EQUIPMENT_GAUGE_PA = 50_000;

const EQUATION_WORDS: Readonly<Record<EquationOfStateId, string>> = {
  'ideal-gas': 'ideal-gas properties',
  'gerg-2008': 'GERG-2008 real-gas properties',
  'peng-robinson': 'Peng-Robinson real-gas properties',
};

/** The closing note of every sizing, naming the property basis. */
export function preliminary(equation: EquationOfStateId): SizingWarning {
  return {
    code: 'preliminary',
    severity: 'caution',
    message: `Preliminary sizing on ${EQUATION_WORDS[equation]}. Confirm with a qualified engineer under the local codes before purchase or construction.`,
  };
}

const c1 = (v: number) => v.toFixed(1);

function surfaceWarnings(gas: GasModel, hottestC: number, heater: boolean): SizingWarning[] {
  const out: SizingWarning[] = [];
  if (heater || hottestC > HOT_SURFACE_C) {
    out.push({
      code: 'hot-surface',
      severity: 'caution',
      message: `Hot surfaces (gas up to ${c1(hottestC)} °C${heater ? '; heating elements hotter still' : ''}): insulate or guard against contact burns.`,
    });
  }
  const flammable = isFlammable(gas);
  if (!flammable && !heater) return out;
  const cls = bestTemperatureClass(hottestC);
  const where = heater
    ? 'Element sheaths run hotter than the gas and must stay within the class even with no flow'
    : 'Casing and piping reach the discharge temperature';
  out.push({
    code: 'temperature-class',
    severity: cls === null && flammable ? 'danger' : flammable ? 'warning' : 'info',
    message:
      cls === null
        ? `Gas at ${c1(hottestC)} °C is above the T1 limit (450 °C, IEC 60079-0): the equipment cannot meet any temperature class where a flammable atmosphere may occur.`
        : `Gas at ${c1(hottestC)} °C: in a hazardous area the equipment can meet at best ${cls.name} (${cls.maxSurfaceC} °C maximum surface, IEC 60079-0). ${where}; check against the area classification.`,
  });
  return out;
}

function pressureWarning(pressurePa: number, barometricPa: number): SizingWarning[] {
  if (pressurePa - barometricPa <= PRESSURE_EQUIPMENT_GAUGE_PA) return [];
  return [
    {
      code: 'pressure-equipment',
      severity: 'info',
      message:
        'Pressure parts above 0.5 bar gauge fall under pressure-equipment codes (e.g. EU PED, ASME VIII): design, relief and inspection to the local code.',
    },
  ];
}

function present(...items: (SizingWarning | null)[]): SizingWarning[] {
  return items.filter((w): w is SizingWarning => w !== null);
}

/**
 * Low-voltage motors are built up to a few hundred kW; above about 400 kW the current at 400-690 V makes
 * cables and switchgear impractical and drives are supplied at medium voltage (3.3-11 kV; 2.3-4.16 kV in North
 * American practice) [cp].
 */
export const LOW_VOLTAGE_MAX_V = 1000;
export const LOW_VOLTAGE_MOTOR_LIMIT_KW = 400;

function mediumVoltageWarning(c: CompressorBlock): SizingWarning | null {
  const rating = c.motor.iecKw ?? c.shaftPowerKw * 1.1;
  if (!c.drive || c.drive.voltageV > LOW_VOLTAGE_MAX_V || rating <= LOW_VOLTAGE_MOTOR_LIMIT_KW) return null;
  return {
    code: 'medium-voltage-drive',
    severity: 'caution',
    message: `A ${Math.round(rating)} kW motor at ${c.drive.voltageV} V would draw about ${Math.round(c.drive.lineCurrentA)} A: above about ${LOW_VOLTAGE_MOTOR_LIMIT_KW} kW, drives are normally supplied at medium voltage (3.3-11 kV, or 2.3-4.16 kV in North American practice). Enter the medium-voltage supply for the line current.`,
  };
}

/** All cautions for a heater duty; always ends with the preliminary note. */
export function heaterWarnings(common: ResolvedCommon, h: HeaterBlock): SizingWarning[] {
  const { gas, inletPressurePa: pressurePa, barometricPressurePa: barometricPa } = common;
  const states: GasState[] = [
    { label: 'heater inlet', temperatureK: h.inletTemperatureC + 273.15, pressurePa },
    { label: 'heater outlet', temperatureK: h.outletTemperatureC + 273.15, pressurePa },
  ];
  const out: SizingWarning[] = [
    ...present(heaterValidity(common, h), dewMarginWarning(common)),
    ...equationWarnings(common, states),
    ...gasWarnings(gas),
  ];
  if (Math.abs(h.temperatureRiseK) > AVERAGE_CP_LIMIT_K) {
    out.push({
      code: 'average-cp-range',
      severity: 'caution',
      message: `Temperature rise ${c1(h.temperatureRiseK)} K exceeds ${AVERAGE_CP_LIMIT_K} K: do not use the average-cp estimate (${c1(h.averageCpDifferencePercent)} % off here); the absorbed duty integrates cp.`,
    });
  }
  if (h.selectedRatingKw === null) {
    out.push({
      code: 'above-rating-list',
      severity: 'warning',
      message: `Design duty ${c1(h.designDutyKw)} kW is above the largest catalogue rating: split into several heaters or supply a longer rating list.`,
    });
  }
  if (h.heatLossPercent === 0 && h.designMarginPercent === 0) {
    out.push({
      code: 'no-allowance',
      severity: 'caution',
      message:
        'No heat-loss allowance or design margin applied: design duty equals absorbed duty (typical: 2-10 % loss, 10-25 % margin).',
    });
  }
  if (h.electrical.subdivisionRequired) {
    out.push({
      code: 'circuit-subdivision',
      severity: 'caution',
      message: `Line current ${c1(h.electrical.currentA)} A exceeds ${SUBDIVISION_LIMIT_A} A: resistance heating is subdivided into circuits of at most ${SUBDIVISION_LIMIT_A} A (NEC 424.22(B)/425.22 where the NEC applies).`,
    });
  }
  out.push(
    {
      code: 'heater-safety-controls',
      severity: 'warning',
      message:
        'Provide an independent manual-reset high-temperature cutout and flow proving, so the heater cannot be energised without gas flow.',
    },
    {
      code: 'supply-voltage',
      severity: 'info',
      message:
        'Heater output varies with the square of voltage (-10 % voltage gives -19 % power): rate the elements at the minimum supply voltage.',
    },
    {
      code: 'electrical-codes',
      severity: 'info',
      message:
        'Currents are for a balanced resistive load; the 125 % continuous-load figure follows NEC 424.4(B)/Art. 425 (IEC practice: IEC 60364-4-43). Electrical work to local codes.',
    },
    ...pressureWarning(pressurePa, barometricPa),
    ...surfaceWarnings(gas, h.outletTemperatureC, true),
    preliminary(common.equation.id),
  );
  return out;
}

function trainStates(stages: readonly CompressorStage[]): GasState[] {
  const states: GasState[] = [];
  for (const s of stages) {
    states.push(
      {
        label: `stage ${s.stage} inlet`,
        temperatureK: s.inletTemperatureC + 273.15,
        pressurePa: s.inletPressureKpa * 1000,
      },
      {
        label: `stage ${s.stage} discharge`,
        temperatureK: s.dischargeTemperatureC + 273.15,
        pressurePa: s.dischargePressureKpa * 1000,
      },
    );
  }
  return states;
}

/** All cautions for a compressor duty; always ends with the preliminary note. */
export function compressorWarnings(common: ResolvedCommon, c: CompressorBlock, cc: CompressorCase): SizingWarning[] {
  const { gas, barometricPressurePa: barometricPa } = common;
  const headline = headlineMethod(c);
  const stages = headline.stages;
  const states = trainStates(stages);
  const out: SizingWarning[] = [
    ...present(dewMarginWarning(common)),
    ...compressorValidity(common, c, cc),
    ...equationWarnings(common, states),
    ...coolerWarnings(headline),
    ...gasWarnings(gas),
  ];
  let hottest = stages[0]!;
  let noCooling = false;
  let methodDtK = 0;
  let maxPa = 0;
  for (let i = 0; i < stages.length; i++) {
    const s = stages[i]!;
    if (s.dischargeTemperatureC > hottest.dischargeTemperatureC) hottest = s;
    if (i < stages.length - 1 && s.dischargeTemperatureC <= c.intercoolerOutletTemperatureC) noCooling = true;
    const a = c.constantK.stages[i]!.dischargeTemperatureC;
    const b = c.variableCp.stages[i]!.dischargeTemperatureC;
    methodDtK = Math.max(methodDtK, Math.abs(a - b));
    maxPa = Math.max(maxPa, s.dischargePressureKpa * 1000);
  }
  if (hottest.dischargeTemperatureC > c.dischargeTemperatureLimitC + 1e-9) {
    const advice =
      c.suggestedStages === null
        ? 'no stage count up to 6 meets it: lower the intercooler temperature or split the duty'
        : `${c.suggestedStages} stages would meet it`;
    out.push({
      code: 'high-discharge-temperature',
      severity: 'warning',
      message: `Stage ${hottest.stage} discharge ${c1(hottest.dischargeTemperatureC)} °C exceeds the ${c1(c.dischargeTemperatureLimitC)} °C limit (about 150 °C for reciprocating process compressors, API 618); ${advice}.`,
    });
  }
  if (c.stagePressureRatio > HIGH_STAGE_RATIO) {
    out.push({
      code: 'high-stage-ratio',
      severity: 'caution',
      message: `Pressure ratio ${c.stagePressureRatio.toFixed(2)} per stage is above ${HIGH_STAGE_RATIO}: consider more stages.`,
    });
  }
  if (noCooling) {
    out.push({
      code: 'intercooler-no-cooling',
      severity: 'caution',
      message:
        'The intercooler outlet temperature is not below a stage discharge: that cooler removes nothing and the next stage takes the gas as discharged.',
    });
  }
  if (methodDtK > 5 || Math.abs(c.methodDifferencePercent) > 1) {
    out.push({
      code: 'method-difference',
      severity: 'info',
      message: `Constant-k and variable-cp differ by ${c.methodDifferencePercent.toFixed(2)} % in gas power and up to ${c1(methodDtK)} K in discharge temperature; variable-cp integrates the property data.`,
    });
  }
  if (c.polytropicEfficiency !== null) {
    out.push({
      code: 'polytropic-converted',
      severity: 'info',
      message: c.realGas
        ? `Real-gas method: polytropic efficiency ${c.polytropicEfficiency} applied along the compression path (integrated in ${c.realGas.polytropicSteps ?? 0} steps per stage); the ideal-gas methods convert it to isentropic ${c.isentropicEfficiency.toFixed(4)} at the suction k.`
        : `Polytropic efficiency ${c.polytropicEfficiency} converted to isentropic ${c.isentropicEfficiency.toFixed(4)} for the stage ratio at the suction k.`,
    });
  }
  if (c.motor.iecKw === null || c.motor.nemaHp === null) {
    out.push({
      code: 'motor-above-series',
      severity: 'warning',
      message:
        'Shaft power with 10 % margin is above the motor series listed (to 10 000 kW and 10 000 hp): select a large machine, or a turbine or engine driver, with its maker.',
    });
  }
  const mv = mediumVoltageWarning(c);
  if (mv) out.push(mv);
  if (c.drive) {
    out.push({
      code: 'motor-data-assumed',
      severity: 'info',
      message: `Motor input and line current use efficiency ${c.drive.motorEfficiency} and power factor ${c.drive.powerFactor}; use the nameplate values of the chosen motor.`,
    });
  }
  out.push(
    ...pressureWarning(maxPa, barometricPa),
    ...surfaceWarnings(gas, hottest.dischargeTemperatureC, false),
    preliminary(common.equation.id),
  );
  return out;
}

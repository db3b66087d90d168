import { PROPERTY_SOURCE } from '../thermo/constants';
import { STANDARD_FLOW_BASES, type StandardFlowBasis } from '../units/flow';
import { DESIGN_DUTY_CONVENTION } from './heater';
import type { ResolvedCommon } from './resolve';
import { standardBasisOf } from './resolve';
import type { BasisInfo, StandardFlowBasisInfo } from './result-types';

function info(b: StandardFlowBasis): StandardFlowBasisInfo {
  return Object.freeze({
    unit: b.unit,
    temperatureC: Number((b.temperatureK - 273.15).toFixed(6)),
    pressureKpa: Number((b.pressurePa / 1000).toFixed(6)),
    description: b.description,
  });
}

const REPORTED = Object.freeze([
  info(STANDARD_FLOW_BASES['Nm3/h']),
  info(STANDARD_FLOW_BASES['Sm3/h']),
  info(STANDARD_FLOW_BASES.SCFM),
]);
const INPUT_BASES = new Map(Object.values(STANDARD_FLOW_BASES).map((b) => [b.unit as string, info(b)]));

export const HEATER_CONVENTIONS: readonly string[] = Object.freeze([
  'absorbed duty = mass flow x (h(T_out) - h(T_in)), h integrated from the NASA polynomials',
  'average-cp estimate = mass flow x cp(mean temperature) x (T_out - T_in), shown for hand checks only',
  DESIGN_DUTY_CONVENTION,
  'outlet at the inlet pressure (gas-side pressure drop not deducted)',
  'line current for a balanced resistive load at nominal voltage, on the selected rating (else the design duty)',
]);

export const COMPRESSOR_CONVENTIONS: readonly string[] = Object.freeze([
  'adiabatic compression; equal pressure ratio per stage, with the interstage pressure drop taken at each of the N-1 intercoolers',
  'constant-k: k and cp at each stage inlet from the gas data unless overridden; T2s = T1 r^((k-1)/k), w = cp (T2 - T1); coolers use the stage cp',
  'variable-cp: s°(T2s) = s°(T1) + R ln r, h2 = h1 + (h(T2s) - h1)/eta_s, T2 from h2; coolers integrate h',
  'polytropic efficiency converted to isentropic per stage at the suction k: eta_s = (r^((k-1)/k) - 1)/(r^((k-1)/(k eta_p)) - 1)',
  'intercoolers between stages only, to the intercooler outlet temperature (default: suction temperature); a cooler never heats',
  'shaft power = gas power / mechanical efficiency; motor at least 10 % above shaft power, no service factor used',
]);

/** The basis section printed on datasheets. */
export function buildBasis(common: ResolvedCommon, composition: string, conventions: readonly string[]): BasisInfo {
  const input = standardBasisOf(common.flowInputUnit);
  return {
    propertySource: PROPERTY_SOURCE,
    gasComposition: composition,
    flowInputBasis: input ? (INPUT_BASES.get(input.unit) ?? null) : null,
    reportedFlowBases: REPORTED as StandardFlowBasisInfo[],
    barometricPressureKpa: common.barometricPressurePa / 1000,
    barometricPressureSource: common.barometricSource,
    conventions: conventions as string[],
  };
}

import { PROPERTY_SOURCE } from '../thermo/constants';
import type { EquationOfStateId } from '../thermo/eos/types';
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

/** Source and range of validity of each equation of state, printed on the datasheet. */
export const EQUATION_SOURCES: Readonly<Record<EquationOfStateId, string>> = {
  'ideal-gas':
    'Ideal gas, Z = 1, with NASA 7-coefficient polynomials (McBride, Gordon & Reno, NASA TM-4513, 1993); valid at low reduced pressure, far from the two-phase region',
  'gerg-2008':
    'GERG-2008 (Kunz & Wagner, J. Chem. Eng. Data 57 (2012) 3032; ISO 20765-2:2015; AGA Report No. 8 Part 2): normal range 90-450 K up to 35 MPa (gas-phase density uncertainty about 0.1 %), extended range 60-700 K up to 70 MPa',
  'peng-robinson':
    'Peng-Robinson (Ind. Eng. Chem. Fundam. 15 (1976) 59) with van der Waals mixing and published binary interaction parameters: gas-phase Z and enthalpy within a few per cent away from the critical point; poor for hydrogen and helium at high pressure',
};

export const REAL_GAS_CONVENTIONS: readonly string[] = Object.freeze([
  'real gas: properties from the equation of state named in the basis: h = h_ideal(T) + h_departure(T, p), s likewise',
  'the inlet is checked to be a gas (pure components against their vapour pressure, mixtures by a tangent-plane stability test with Peng-Robinson); a liquid or two-phase inlet is refused',
  'standard volumes use the real Z at their reference conditions (ISO 13443 conditions, ISO 6976 practice)',
]);

export const COMPRESSOR_CONVENTIONS: readonly string[] = Object.freeze([
  'adiabatic compression; equal pressure ratio per stage, with the interstage pressure drop taken at each of the N-1 intercoolers',
  'constant-k: k and cp at each stage inlet from the gas data unless overridden; T2s = T1 r^((k-1)/k), w = cp (T2 - T1); coolers use the stage cp',
  'variable-cp: s°(T2s) = s°(T1) + R ln r, h2 = h1 + (h(T2s) - h1)/eta_s, T2 from h2; coolers integrate h',
  'polytropic efficiency converted to isentropic per stage at the suction k: eta_s = (r^((k-1)/k) - 1)/(r^((k-1)/(k eta_p)) - 1)',
  'intercoolers between stages only, to the intercooler outlet temperature (default: suction temperature); a cooler never heats',
  'shaft power = gas power / mechanical efficiency; motor at least 10 % above shaft power, no service factor used',
]);

export const REAL_GAS_HEATER_CONVENTIONS: readonly string[] = Object.freeze([
  'real gas: absorbed duty = mass flow x (h(T_out, p) - h(T_in, p)) at the operating pressure; the ideal-gas duty is shown beside it',
]);

export const REAL_GAS_COMPRESSOR_CONVENTIONS: readonly string[] = Object.freeze([
  "real-gas method (the headline when a real-gas equation is used): isentropic h2s = h(p2, s1), h2 = h1 + (h2s - h1)/eta_s, T2 from (p2, h2); polytropic head by Schultz's method (ASME PTC 10)",
  'real-gas method with a polytropic efficiency: the path dh = v dp/eta_p integrated in steps (fourth-order Runge-Kutta), no conversion to an isentropic efficiency',
  'coolers: duty = m (h_in - h_out) at the cooler outlet pressure; condensate is knocked out and only the vapour goes on to the next stage',
  'head in metres = specific head / g (g = 9.80665 m/s2)',
]);

/** The basis section printed on datasheets. */
export function buildBasis(
  common: ResolvedCommon,
  composition: string,
  conventions: readonly string[],
  realConventions: readonly string[] = [],
): BasisInfo {
  const input = standardBasisOf(common.flowInputUnit);
  const real = common.equation.id !== 'ideal-gas';
  return {
    equationOfState: common.equation.id,
    equationOfStateReason: common.equation.reason,
    equationOfStateSource: EQUATION_SOURCES[common.equation.id],
    standardVolumeBasis: real
      ? `real gas: Z at each reference state from ${common.equation.id} (Z = ${(common.zAt?.(288.15, 101_325) ?? 1).toFixed(5)} at 15 °C and 101.325 kPa)`
      : 'ideal gas: Z = 1 at every reference state',
    propertySource: PROPERTY_SOURCE,
    gasComposition: composition,
    flowInputBasis: input ? (INPUT_BASES.get(input.unit) ?? null) : null,
    reportedFlowBases: REPORTED as StandardFlowBasisInfo[],
    barometricPressureKpa: common.barometricPressurePa / 1000,
    barometricPressureSource: common.barometricSource,
    conventions: real ? [...conventions, ...REAL_GAS_CONVENTIONS, ...realConventions] : (conventions as string[]),
  };
}

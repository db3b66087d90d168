import { GAS_CONSTANT_J_PER_MOL_K } from '../../thermo/constants';
import { EosError } from '../../thermo/eos/eos-error';
import { ThermoRangeError } from '../../thermo/errors';
import { CoolerFloodedError } from './condensation';
import type { CompressorCase } from '../compressor';
import { pseudoCritical } from '../pseudo-critical';
import type { ResolvedCommon } from '../resolve';
import type { CompressionMethodResult, CompressorBlock, HeaterBlock, SizingWarning } from '../result-types';
import { chooseEquation } from './equation-choice';
import { gasState, realFluid, type RealFluid } from './fluid';
import { runRealGasTrain } from './train';

/** Real and ideal gas are judged by the figures: beyond this difference ideal gas is not good enough [cp]. */
export const REAL_GAS_DIFFERENCE_PERCENT = 2;

const f1 = (v: number) => v.toFixed(1);
const NAMES = { 'gerg-2008': 'GERG-2008', 'peng-robinson': 'Peng-Robinson', 'ideal-gas': 'ideal gas' } as const;

// The equation an ideal-gas request is judged against: Peng-Robinson, which is cheap and good to a fraction of
// the 2 % threshold for most gases, but the engine's own choice where hydrogen or helium matter, which
// Peng-Robinson gets wrong at pressure.
function referenceFluid(common: ResolvedCommon): RealFluid | null {
  const x = common.gas.moleFractions;
  const quantum = (x.H2 ?? 0) + (x.He ?? 0) >= 0.1;
  const id = quantum ? chooseEquation(common.gas, undefined).id : 'peng-robinson';
  if (id === 'ideal-gas') return null;
  try {
    return realFluid(common.gas, id);
  } catch {
    return null;
  }
}

/** `percent` is (ideal - real) / real x 100 for the quantity named by `what`. */
function differenceWarning(what: string, idealAsked: boolean, eq: string, percent: number, detail = ''): SizingWarning {
  const direction = `${percent > 0 ? 'overstates' : 'understates'} the ${what} by ${f1(Math.abs(percent))} %${detail}`;
  return {
    code: 'real-gas-effect',
    severity: Math.abs(percent) > 2 * REAL_GAS_DIFFERENCE_PERCENT ? 'warning' : 'caution',
    message: idealAsked
      ? `Sized on ideal gas as asked, but against ${eq} ideal gas ${direction}: size on a real-gas equation for a quote.`
      : `Ideal gas ${direction}; the headline figures use ${eq}.`,
  };
}

/**
 * Residual enthalpy from the generalized second-virial correlation, J/mol:
 * h_R/(R Tc) = Pr [B0 - Tr dB0/dTr + w (B1 - Tr dB1/dTr)], B0 = 0.083 - 0.422/Tr^1.6, B1 = 0.139 - 0.172/Tr^4.2
 * [pub: Pitzer & Curl (1957); Abbott's correlation as given in Smith, Van Ness & Abbott, Introduction to
 * Chemical Engineering Thermodynamics]. Only a screen: it says when a real-gas check is not worth running.
 */
function virialResidualEnthalpy(common: ResolvedCommon, temperatureK: number, pressurePa: number): number {
  const pc = pseudoCritical(common.gas);
  const tr = temperatureK / pc.tcK;
  const pr = pressurePa / pc.pcPa;
  const b0 = 0.083 - 0.422 / Math.pow(tr, 1.6);
  const b1 = 0.139 - 0.172 / Math.pow(tr, 4.2);
  const db0 = 0.675 / Math.pow(tr, 2.6);
  const db1 = 0.722 / Math.pow(tr, 5.2);
  return GAS_CONSTANT_J_PER_MOL_K * pc.tcK * pr * (b0 - tr * db0 + pc.omega * (b1 - tr * db1));
}

/** The screen's margin: a real-gas check runs when the virial estimate exceeds a quarter of the threshold. */
const SCREEN_FRACTION = 0.25;

// True when the departures at every state are too small, next to the ideal enthalpy change, to move a figure by
// a quarter of the 2 % threshold: then the rigorous comparison is skipped.
function negligible(common: ResolvedCommon, states: [number, number][], idealChangeJPerMol: number): boolean {
  let worst = 0;
  for (const [t, p] of states) worst = Math.max(worst, Math.abs(virialResidualEnthalpy(common, t, p)));
  return 2 * worst < ((SCREEN_FRACTION * REAL_GAS_DIFFERENCE_PERCENT) / 100) * Math.abs(idealChangeJPerMol);
}

/** Compares the heater's ideal-gas duty with the real-gas one. */
export function heaterValidity(common: ResolvedCommon, h: HeaterBlock): SizingWarning | null {
  if (common.fluid) {
    const d = h.idealGasDifferencePercent ?? 0;
    if (Math.abs(d) <= REAL_GAS_DIFFERENCE_PERCENT) return null;
    return differenceWarning('absorbed duty', false, NAMES[common.fluid.id], d);
  }
  const p = common.inletPressurePa;
  const t1 = h.inletTemperatureC + 273.15;
  const t2 = h.outletTemperatureC + 273.15;
  const kgPerMol = common.gas.molarMassKgPerKmol / 1000;
  const idealChange = (h.idealGasDutyKw * 1000 * kgPerMol) / common.massFlowKgPerS;
  if (
    negligible(
      common,
      [
        [t1, p],
        [t2, p],
      ],
      idealChange,
    )
  )
    return null;
  const ref = referenceFluid(common);
  if (!ref) return null;
  try {
    const a = gasState(ref, h.inletTemperatureC + 273.15, p);
    const b = gasState(ref, h.outletTemperatureC + 273.15, p);
    const real = (common.massFlowKgPerS * (b.enthalpyJPerMol - a.enthalpyJPerMol)) / ref.kgPerMol / 1000;
    const d = ((h.absorbedDutyKw - real) / real) * 100;
    return Math.abs(d) > REAL_GAS_DIFFERENCE_PERCENT
      ? differenceWarning('absorbed duty', true, NAMES[ref.id], d)
      : null;
  } catch (err) {
    if (err instanceof EosError || err instanceof ThermoRangeError) return null;
    throw err;
  }
}

// Largest discharge-temperature difference as a share of the stage's temperature rise, %.
function temperatureDifference(ideal: CompressionMethodResult, real: CompressionMethodResult): number {
  let worst = 0;
  for (let i = 0; i < real.stages.length; i++) {
    const r = real.stages[i]!;
    const id = ideal.stages[i]!;
    const rise = r.dischargeTemperatureC - r.inletTemperatureC;
    const d = ((id.dischargeTemperatureC - r.dischargeTemperatureC) / rise) * 100;
    if (Math.abs(d) > Math.abs(worst)) worst = d;
  }
  return worst;
}

/** Compares the compressor's ideal-gas (variable-cp) figures with the real-gas ones. */
export function compressorValidity(common: ResolvedCommon, c: CompressorBlock, cc: CompressorCase): SizingWarning[] {
  let real = c.realGas;
  let eq = common.fluid ? NAMES[common.fluid.id] : '';
  const idealAsked = !common.fluid;
  if (!real) {
    const ideal = c.basis === 'constant-k' ? c.constantK : c.variableCp;
    const states: [number, number][] = ideal.stages.flatMap((st) => [
      [st.inletTemperatureC + 273.15, st.inletPressureKpa * 1000] as [number, number],
      [st.dischargeTemperatureC + 273.15, st.dischargePressureKpa * 1000] as [number, number],
    ]);
    const smallest = Math.min(...ideal.stages.map((st) => st.specificWorkKjPerKg));
    if (negligible(common, states, smallest * 1000 * (common.gas.molarMassKgPerKmol / 1000))) return [];
    const ref = referenceFluid(common);
    if (!ref) return [];
    eq = NAMES[ref.id];
    try {
      const eff =
        cc.isentropicEfficiency !== null
          ? { isentropic: cc.isentropicEfficiency, polytropic: null }
          : { isentropic: null, polytropic: cc.polytropicEfficiency ?? 1 };
      real = runRealGasTrain(cc, ref, cc.stages, eff);
    } catch (err) {
      if (err instanceof EosError || err instanceof ThermoRangeError || err instanceof CoolerFloodedError) return [];
      throw err;
    }
  }
  const ideal = c.basis === 'constant-k' ? c.constantK : c.variableCp;
  const power = ((ideal.gasPowerKw - real.gasPowerKw) / real.gasPowerKw) * 100;
  const temperature = temperatureDifference(ideal, real);
  if (Math.abs(power) <= REAL_GAS_DIFFERENCE_PERCENT && Math.abs(temperature) <= REAL_GAS_DIFFERENCE_PERCENT) return [];
  const detail = ` (discharge temperatures ${temperature > 0 ? 'higher' : 'lower'} by up to ${f1(Math.abs(temperature))} % of the temperature rise)`;
  return [differenceWarning('gas power', idealAsked, eq, power, detail)];
}

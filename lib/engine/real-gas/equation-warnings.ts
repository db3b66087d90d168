import type { GasState } from '../pseudo-critical';
import type { ResolvedCommon } from '../resolve';
import type { CompressionMethodResult, SizingWarning } from '../result-types';

/** GERG-2008's normal and extended ranges [pub: Kunz & Wagner (2012), section 5; ISO 20765-2]. */
const GERG_NORMAL = { minK: 90, maxK: 450, maxPa: 35e6 };
const GERG_EXTENDED = { minK: 60, maxK: 700, maxPa: 70e6 };
/** Quantum gases above this share and pressure are where Peng-Robinson goes wrong [cp]. */
const QUANTUM_SHARE = 0.1;
const QUANTUM_PRESSURE_PA = 5e6;
/** Below this Z the fluid is dense-phase, liquid-like [cp]. */
const DENSE_Z = 0.5;

const f1 = (v: number) => v.toFixed(1);

function gergRange(states: readonly GasState[]): SizingWarning | null {
  let level: 'normal' | 'extended' | 'outside' = 'normal';
  let where = '';
  for (const s of states) {
    const t = s.temperatureK;
    const p = s.pressurePa;
    const inNormal = t >= GERG_NORMAL.minK && t <= GERG_NORMAL.maxK && p <= GERG_NORMAL.maxPa;
    const inExtended = t >= GERG_EXTENDED.minK && t <= GERG_EXTENDED.maxK && p <= GERG_EXTENDED.maxPa;
    if (!inExtended) {
      level = 'outside';
      where = `${s.label} (${f1(t - 273.15)} °C, ${f1(p / 1e6)} MPa)`;
      break;
    }
    if (!inNormal && level === 'normal') {
      level = 'extended';
      where = `${s.label} (${f1(t - 273.15)} °C, ${f1(p / 1e6)} MPa)`;
    }
  }
  if (level === 'normal') return null;
  return level === 'extended'
    ? {
        code: 'equation-range',
        severity: 'info',
        message: `The ${where} lies in GERG-2008's extended range (60-700 K, to 70 MPa), where its uncertainty is larger than the 0.1 % of the normal range.`,
      }
    : {
        code: 'equation-range',
        severity: 'caution',
        message: `The ${where} lies outside GERG-2008's validated range (60-700 K, to 70 MPa): the figures there are extrapolated.`,
      };
}

/** Cautions about the equation of state in use at the states of this duty. */
export function equationWarnings(common: ResolvedCommon, states: readonly GasState[]): SizingWarning[] {
  const out: SizingWarning[] = [];
  const id = common.equation.id;
  const x = common.gas.moleFractions;
  const quantum = (x.H2 ?? 0) + (x.He ?? 0);
  const maxPa = Math.max(...states.map((s) => s.pressurePa));
  if (id === 'gerg-2008') {
    const range = gergRange(states);
    if (range) out.push(range);
  }
  if (id === 'peng-robinson' && quantum >= QUANTUM_SHARE && maxPa > QUANTUM_PRESSURE_PA) {
    out.push({
      code: 'equation-quantum-gas',
      severity: 'warning',
      message: `Peng-Robinson is poor for hydrogen and helium at high pressure (here ${f1(100 * quantum)} mol % at up to ${f1(maxPa / 1e6)} MPa): size on GERG-2008 where it covers the gas.`,
    });
  }
  if (id !== 'ideal-gas' && common.inletZ < DENSE_Z) {
    out.push({
      code: 'dense-phase',
      severity: 'caution',
      message: `The inlet is a dense supercritical fluid (Z = ${common.inletZ.toFixed(3)}, ${f1(common.inletDensityKgPerM3)} kg/m3): it behaves more like a liquid than a gas; machine selection for dense phase differs.`,
    });
  }
  return out;
}

/** A warning for every cooler that condenses liquid. */
export function coolerWarnings(method: CompressionMethodResult): SizingWarning[] {
  const out: SizingWarning[] = [];
  for (const s of method.stages) {
    const cooler = s.cooler;
    if (!cooler || !(cooler.condensateKgPerH > 0)) continue;
    const where = cooler.kind === 'aftercooler' ? 'aftercooler' : `intercooler after stage ${s.stage}`;
    const all = cooler.condensateKgPerH >= 0.999 * s.massFlowKgPerS * 3600;
    if (all) {
      out.push({
        code: 'cooler-condensate',
        severity: 'warning',
        message: `The ${where} condenses the whole stream (${f1(cooler.condensateKgPerH)} kg/h) at ${f1(cooler.outletTemperatureC)} °C: it leaves as a liquid, and its duty includes ${f1(cooler.latentDutyKw)} kW of condensation. Design the cooler and what follows it for liquid.`,
      });
      continue;
    }
    out.push({
      code: 'cooler-condensate',
      severity: 'warning',
      message: `The ${where} condenses ${f1(cooler.condensateKgPerH)} kg/h of liquid at ${f1(cooler.outletTemperatureC)} °C (its duty includes ${f1(cooler.latentDutyKw)} kW of latent heat): provide a separator and drain; only the vapour goes on.`,
    });
  }
  return out;
}

/** Suction or heater inlets closer than this to their dew point are flagged [cp: a common design margin]. */
export const DEW_MARGIN_K = 5;

/** A caution when the inlet is a gas within 10 K of its dew point: a little cooling or a pressure swing condenses it. */
export function dewMarginWarning(common: ResolvedCommon): SizingWarning | null {
  const c = common.inletClass;
  if (c.phase !== 'gas' || c.dewMarginK === undefined || c.dewPointK === undefined) return null;
  if (c.dewMarginK >= DEW_MARGIN_K) return null;
  const water = Object.keys(common.gas.moleFractions).length > 1 && common.gas.moleFractions.H2O !== undefined;
  return {
    code: 'near-dew-point',
    severity: 'caution',
    message: `The inlet is only ${f1(c.dewMarginK)} K above its dew point (${f1(c.dewPointK - 273.15)} °C at ${f1(common.inletPressurePa / 1000)} kPa${water ? '' : ', Peng-Robinson'}): liquid can form with a little cooling or a pressure change upstream. Keep at least ${DEW_MARGIN_K} K of superheat, e.g. with a knock-out drum and a preheater.`,
  };
}

import {
  fixed,
  formatA,
  formatHp,
  formatKw,
  formatPercent,
  joined,
  showPressure,
  showTemperature,
} from '@/app/_components/sizing-result/quantity-format';
import type { CompressorResult, MotorSelection } from '@/lib/engine';
import { EQUATION_NAMES, METHOD_NAMES, headlineMethod } from '@/lib/engine/headline-method';
import type { UnitSystem } from '@/lib/units';

const kw = (v: number) => `${formatKw(v)} kW`;

/** "IEC 315 kW / NEMA 400 hp": ratings are series values, printed as listed. */
export function motorText(m: MotorSelection): string {
  return [m.iecKw === null ? null : `IEC ${m.iecKw} kW`, m.nemaHp === null ? null : `NEMA ${m.nemaHp} hp`]
    .filter(Boolean)
    .join(' / ');
}

/** Headline and figure lines of a compressor result. */
export function compressorLines(r: CompressorResult, system: UnitSystem): { headline: string[]; figures: string[] } {
  const c = r.compressor;
  const m = c.motor;
  const motor = motorText(m);
  const headline = headlineMethod(c);
  const p = (kpa: number) => joined(showPressure(kpa, system));
  const stageLines = headline.stages.map(
    (s) =>
      `  Stage ${s.stage}: ${p(s.inletPressureKpa)} to ${p(s.dischargePressureKpa)} (ratio ${fixed(s.pressureRatio, 3)}), ` +
      `${joined(showTemperature(s.inletTemperatureC, system))} in, ${joined(showTemperature(s.dischargeTemperatureC, system))} out, ` +
      `Z ${fixed(s.inletZ, 4)} in, polytropic head ${fixed(s.polytropicHeadKjPerKg, 1)} kJ/kg, ${kw(s.gasPowerKw)}` +
      (s.cooler && s.cooler.condensateKgPerH > 0
        ? `, cooler condenses ${fixed(s.cooler.condensateKgPerH, 1)} kg/h`
        : ''),
  );
  return {
    headline: [
      `Shaft power: ${kw(c.shaftPowerKw)} (${formatHp(c.shaftPowerKw)} hp), ${c.stageCount} stage${c.stageCount > 1 ? 's' : ''}, ${METHOD_NAMES[c.basis]} basis (${EQUATION_NAMES[r.basis.equationOfState]})`,
      `Motor: ${motor || 'above the standard series'} (at least ${fixed(m.requiredMarginPercent, 0)} % over shaft power)` +
        (c.lineCurrentA === null
          ? ''
          : `; ${formatA(c.lineCurrentA)} A line current at ${c.drive ? fixed(c.drive.voltageV, 0) : ''} V`),
    ],
    figures: [
      `Suction ${p(c.suctionPressureKpa)}, discharge ${p(c.dischargePressureKpa)}, overall ratio ${fixed(c.overallPressureRatio, 3)}`,
      `Stage efficiency (isentropic) ${fixed(c.isentropicEfficiency, 4)}${c.polytropicEfficiency === null ? '' : ` from polytropic ${c.polytropicEfficiency}`}; mechanical ${c.mechanicalEfficiency}`,
      `Gas power: ${c.realGas ? `real gas ${kw(c.realGas.gasPowerKw)}, ` : ''}constant-k ${kw(c.constantK.gasPowerKw)}, variable-cp ${kw(c.variableCp.gasPowerKw)} (constant-k vs variable-cp ${formatPercent(c.methodDifferencePercent)} %${c.idealGasDifferencePercent === null ? '' : `; ideal vs real gas ${formatPercent(c.idealGasDifferencePercent)} %`})`,
      `Stages (${METHOD_NAMES[c.basis]}):`,
      ...stageLines,
      `Intercooler duties: ${headline.intercoolerDutiesKw.length ? headline.intercoolerDutiesKw.map(kw).join(', ') : 'none (single stage)'}`,
      `Discharge temperature limit ${joined(showTemperature(c.dischargeTemperatureLimitC, system))}; ` +
        (c.suggestedStages === null
          ? 'no stage count up to 6 keeps under it'
          : `${c.suggestedStages} stage${c.suggestedStages > 1 ? 's' : ''} keep every stage under it`),
    ],
  };
}

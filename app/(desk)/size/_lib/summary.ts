import { EQUATION_NAMES } from '@/lib/engine/headline-method';
import { figure, fixed, joined, showMassFlow, showTemperature } from '@/app/_components/sizing-result/quantity-format';
import { SEVERITY_LABEL, groupWarnings, preliminaryOf } from '@/app/_components/sizing-result/severity';
import type { SizingResult } from '@/lib/engine';
import type { UnitSystem } from '@/lib/units';
import { compressorLines } from './summary-compressor';
import { heaterLines } from './summary-heater';

function dutyPoint(r: SizingResult, system: UnitSystem): string[] {
  const f = r.flows;
  return [
    `Gas: ${r.gas.label} (M ${fixed(r.molarMassKgPerKmol, 3)} kg/kmol)`,
    `Flow: ${joined(showMassFlow(r.massFlowKgPerS, system))} (${fixed(r.massFlowKgPerS, 4)} kg/s); ${figure(f.normalM3PerH)} Nm³/h; ` +
      `${figure(f.standardM3PerH)} Sm³/h; ${figure(f.scfm)} SCFM; ${fixed(f.mmscfd, 4)} MMSCFD`,
    `${r.service === 'compressor' ? 'Suction' : 'Inlet'}: ${joined(showTemperature(r.inletTemperatureC, system))} at ${fixed(r.inletPressureKpa, 3)} kPa abs; ` +
      `actual ${fixed(r.inletActualFlowM3PerH, 1)} m³/h`,
  ];
}

/**
 * The plain-text summary "Copy summary" puts on the clipboard: headline, duty point, figures, warnings by
 * severity, basis and the preliminary statement, in that order.
 */
export function buildSummary(r: SizingResult, system: UnitSystem, link?: string): string {
  const title =
    r.service === 'heater'
      ? 'Electric process gas heater'
      : `Gas compressor, ${r.compressor.stageCount} stage${r.compressor.stageCount > 1 ? 's' : ''}`;
  const lines = r.service === 'heater' ? heaterLines(r, system) : compressorLines(r, system);
  const warnings = groupWarnings(r.warnings).flatMap((g) =>
    g.warnings.map((w) => `- ${SEVERITY_LABEL[g.severity].toUpperCase()}: ${w.message}`),
  );
  const b = r.basis;
  const out = [
    `Dutywise sizing summary (PRELIMINARY): ${title}`,
    '',
    ...lines.headline,
    '',
    'Duty point',
    ...dutyPoint(r, system).map((l) => `  ${l}`),
    '',
    'Figures',
    ...lines.figures.map((l) => `  ${l}`),
    '',
    'Warnings and cautions',
    ...(warnings.length ? warnings : ['- none beyond the preliminary statement']),
    '',
    'Basis',
    `  Equation of state: ${EQUATION_NAMES[b.equationOfState]} (${b.equationOfStateReason})`,
    `  ${b.equationOfStateSource}`,
    `  Standard volumes: ${b.standardVolumeBasis}`,
    `  Ideal-gas data: ${b.propertySource}`,
    `  Gas: ${b.gasComposition}`,
    `  Site barometric pressure ${fixed(b.barometricPressureKpa, 3)} kPa (${b.barometricPressureSource})`,
    ...(b.flowInputBasis ? [`  Flow entered as ${b.flowInputBasis.unit} at ${b.flowInputBasis.description}`] : []),
    ...b.conventions.map((c) => `  ${c}`),
    `  Engine ${r.engineVersion}`,
    '',
    preliminaryOf(r),
  ];
  if (link) out.push('', `Reopen these inputs: ${link}`);
  return out.join('\n');
}

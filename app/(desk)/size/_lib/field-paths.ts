import type { SizingIssue } from '@/lib/engine';
import type { DeskService } from './form-types';

/** The desk's error keys: one per input (quantities keyed by their path, not ".value"). */
export const FIELD_LABELS = {
  service: 'Service',
  'site.barometricPressure': 'Site barometric pressure',
  'gas.preset': 'Gas',
  'gas.relativeHumidityPercent': 'Relative humidity',
  'gas.dewPoint': 'Dew point',
  'gas.components': 'Mixture',
  'gas.basis': 'Fraction basis',
  equationOfState: 'Equation of state',
  flow: 'Flow',
  'inlet.temperature': 'Inlet temperature',
  'inlet.pressure': 'Inlet pressure',
  outletTemperature: 'Outlet temperature',
  heatLossPercent: 'Heat loss',
  designMarginPercent: 'Design margin',
  'supply.voltageV': 'Supply voltage',
  'supply.phases': 'Phases',
  heaterRatingsKw: 'Catalogue ratings',
  dischargePressure: 'Discharge pressure',
  stages: 'Stages',
  efficiency: 'Stage efficiency',
  intercoolerOutletTemperature: 'Intercooler outlet temperature',
  interstagePressureDropPercent: 'Interstage pressure drop',
  mechanicalEfficiency: 'Mechanical efficiency',
  method: 'Method basis',
  dischargeTemperatureLimit: 'Discharge temperature limit',
} as const;

export type FieldKey = keyof typeof FIELD_LABELS;

/** Compressors take gas in at suction. */
export function fieldLabel(key: FieldKey, service: DeskService): string {
  if (service === 'compressor' && key === 'inlet.temperature') return 'Suction temperature';
  if (service === 'compressor' && key === 'inlet.pressure') return 'Suction pressure';
  return FIELD_LABELS[key];
}

const isFieldKey = (k: string): k is FieldKey => k in FIELD_LABELS;

/** The desk field an engine issue path belongs to, or null for issues about the request as a whole. */
export function fieldKeyOf(path: string): FieldKey | null {
  let p = path.replace(/\.(value|unit)$/, '');
  if (p.startsWith('gas.components')) return 'gas.components';
  if (p.startsWith('heaterRatingsKw')) return 'heaterRatingsKw';
  if (p === 'isentropicEfficiency' || p === 'polytropicEfficiency') return 'efficiency';
  if (p === 'gas') return 'gas.preset';
  if (p === 'site' || p === 'site.altitudeM') p = 'site.barometricPressure';
  return isFieldKey(p) ? p : null;
}

export type DeskIssues = { fields: Partial<Record<FieldKey, string>>; general: string[] };

// The engine names the component or list entry after the field path; keep that detail in the text.
function detail(path: string): string {
  const m = /^(?:gas\.components|heaterRatingsKw)\.([^.]+)/.exec(path);
  if (!m?.[1]) return '';
  return path.startsWith('heaterRatingsKw') ? `entry ${Number(m[1]) + 1}: ` : `${m[1]}: `;
}

/** Engine issues keyed by desk field, each message opening with the field's name. */
export function groupIssues(issues: readonly SizingIssue[], service: DeskService): DeskIssues {
  const out: DeskIssues = { fields: {}, general: [] };
  for (const issue of issues) {
    const key = fieldKeyOf(issue.path);
    if (!key) {
      out.general.push(issue.path ? `${issue.path}: ${issue.message}` : issue.message);
      continue;
    }
    const text = `${detail(issue.path)}${issue.message}`;
    const prior = out.fields[key];
    out.fields[key] = prior ? `${prior}; ${text}` : `${fieldLabel(key, service)}: ${text}`;
  }
  return out;
}

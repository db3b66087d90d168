import { formatKgPerH, formatKpa, formatTemperatureC, withSheetUnits } from '@/lib/datasheets/format';
import { formatHeadline } from '@/lib/sizings/headline';

type StoredResult = {
  massFlowKgPerS?: number;
  inletTemperatureC?: number;
  inletPressureKpa?: number;
  heater?: { outletTemperatureC?: number };
  compressor?: { dischargePressureKpa?: number };
};

const finite = (...xs: (number | undefined)[]): boolean => xs.every((x) => Number.isFinite(x));

/**
 * A quote line's figures as an e-mail or cover sheet shows them, in the account's units: the headline, then the
 * mass flow and the temperatures (heater) or pressures (compressor) it was sized for.
 */
export function lineFigures(
  service: 'heater' | 'compressor',
  headlineKw: number,
  result: unknown,
  system: 'si' | 'us',
): string {
  const r = (result ?? {}) as StoredResult;
  return withSheetUnits(system, () => {
    const parts = [formatHeadline(service, headlineKw)];
    if (finite(r.massFlowKgPerS)) parts.push(formatKgPerH(r.massFlowKgPerS! * 3600));
    if (service === 'heater' && finite(r.inletTemperatureC, r.heater?.outletTemperatureC))
      parts.push(`${formatTemperatureC(r.inletTemperatureC!)} to ${formatTemperatureC(r.heater!.outletTemperatureC!)}`);
    if (service === 'compressor' && finite(r.inletPressureKpa, r.compressor?.dischargePressureKpa))
      parts.push(`${formatKpa(r.inletPressureKpa!)} to ${formatKpa(r.compressor!.dischargePressureKpa!)}`);
    return parts.join(', ');
  });
}

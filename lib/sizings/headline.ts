import { figure } from '@/lib/units';

/** One-line headline of a saved sizing, as quotes and lists show it. */
export function formatHeadline(service: 'heater' | 'compressor', headlineKw: number): string {
  const kw = figure(headlineKw);
  return service === 'heater' ? `${kw} kW design duty` : `${kw} kW shaft power`;
}

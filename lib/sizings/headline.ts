/** One-line headline of a saved sizing, as quotes and lists show it. */
export function formatHeadline(service: 'heater' | 'compressor', headlineKw: number): string {
  const kw =
    headlineKw >= 100 ? headlineKw.toFixed(0) : headlineKw >= 10 ? headlineKw.toFixed(1) : headlineKw.toFixed(2);
  return service === 'heater' ? `${kw} kW design duty` : `${kw} kW shaft power`;
}

import { describe, expect, it } from 'vitest';
import { calculate } from '@/lib/engine';
import { readStoredSizing } from '@/lib/sizings/stored-result';
import { compressorRequest, heaterRequest } from '../engine/requests';

// Saved sizings are JSON round trips of the engine's input and result; the record page shows them with
// the desk's breakdown only when their shape is one this engine knows.
const roundTrip = <T>(v: T): T => JSON.parse(JSON.stringify(v)) as T;

describe('reading a saved sizing for display', () => {
  it('accepts what the engine saved, for both services, and keeps the saved figures', () => {
    for (const request of [heaterRequest(), compressorRequest({ stages: 2 })]) {
      const result = roundTrip(calculate(request));
      const stored = readStoredSizing(roundTrip(request), result);
      expect(stored?.result).toBe(result);
      expect(stored?.input.service).toBe(request.service);
    }
  });

  it('refuses a result from another engine major version, of another service, or missing its block', () => {
    const request = heaterRequest();
    const result = roundTrip(calculate(request)) as unknown as Record<string, unknown>;
    expect(readStoredSizing(request, { ...result, engineVersion: '1.0.0' })).toBeNull();
    expect(readStoredSizing(request, { ...result, engineVersion: '3.0.0' })).toBeNull();
    expect(readStoredSizing(compressorRequest(), result)).toBeNull();
    expect(readStoredSizing(request, { ...result, heater: undefined })).toBeNull();
    expect(readStoredSizing(request, { ...result, warnings: 'none' })).toBeNull();
    expect(readStoredSizing({ service: 'heater' }, result)).toBeNull();
    expect(readStoredSizing(request, null)).toBeNull();
  });
});

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { SizingInputError, calculate } from '@/lib/engine';
import { SPECIES_IDS } from '@/lib/thermo';

const q = (value: number, unit: string) => ({ value, unit });

function allFinite(v: unknown): boolean {
  if (typeof v === 'number') return Number.isFinite(v);
  if (Array.isArray(v)) return v.every(allFinite);
  if (v && typeof v === 'object') return Object.values(v).every(allFinite);
  return true;
}

const composition = fc
  .uniqueArray(fc.constantFrom(...SPECIES_IDS), { minLength: 1, maxLength: 4 })
  .chain((ids) =>
    fc.tuple(
      fc.constant(ids),
      fc.array(fc.double({ min: 0.01, max: 1, noNaN: true }), { minLength: ids.length, maxLength: ids.length }),
    ),
  )
  .map(([ids, w]) => {
    const sum = w.reduce((a, b) => a + b, 0);
    return Object.fromEntries(ids.map((id, i) => [id, w[i]! / sum]));
  });
const equation = fc.constantFrom(undefined, 'gerg-2008', 'peng-robinson', 'ideal-gas');

// Any gas the engine knows, at any state from vacuum to 15 MPa and -50 to 250 °C, on every equation: the answer
// is a sizing with finite figures or a refusal naming a field, never an exception of another kind.
describe('real-gas engine on arbitrary gases and states', () => {
  it('sizes or refuses with a field, never crashes, and every figure is finite', () => {
    fc.assert(
      fc.property(
        composition,
        equation,
        fc.double({ min: -50, max: 250, noNaN: true }),
        fc.double({ min: 50, max: 15_000, noNaN: true }),
        fc.double({ min: 1.2, max: 20, noNaN: true }),
        fc.integer({ min: 1, max: 6 }),
        fc.double({ min: -30, max: 30, noNaN: true }),
        fc.boolean(),
        (components, equationOfState, tC, pKpa, ratio, stages, coolerOffsetK, heater) => {
          const common = {
            gas: { components },
            flow: q(5000, 'kg/h'),
            inlet: { temperature: q(tC, 'degC'), pressure: q(pKpa, 'kPa') },
            equationOfState,
          };
          const request = heater
            ? { service: 'heater', ...common, outletTemperature: q(tC + 150, 'degC') }
            : {
                service: 'compressor',
                ...common,
                dischargePressure: q(Math.min(pKpa * ratio, 99_000), 'kPa'),
                stages,
                polytropicEfficiency: 0.8,
                intercoolerOutletTemperature: q(tC + coolerOffsetK, 'degC'),
              };
          try {
            expect(allFinite(calculate(request))).toBe(true);
          } catch (err) {
            if (!(err instanceof SizingInputError)) throw err;
            expect(err.issues.length).toBeGreaterThan(0);
            for (const issue of err.issues) expect(issue.message.length).toBeGreaterThan(10);
          }
        },
      ),
      { numRuns: 400 },
    );
  });
});

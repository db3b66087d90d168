import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { stateFromEnthalpy, stateFromEntropy } from '@/lib/thermo/eos/flash';
import { compressPolytropic } from '@/lib/thermo/eos/polytropic-path';
import { densityAt, newFluidState, stateAt, stateAtDensity } from '@/lib/thermo/eos/state';
import { virialGas } from './virial-fixture';

// Thermodynamic consistency of the property layer on a gas whose residual Helmholtz energy is known in closed
// form. Each check compares an analytic property with a finite difference of another one, so an algebra slip in
// state.ts (a sign, a missing term) fails here whatever the equation of state.
const eos = virialGas();
const temperatures = fc.double({ min: 220, max: 700, noNaN: true });
const pressures = fc.double({ min: 1e5, max: 3e6, noNaN: true });

describe('real-gas property layer', () => {
  it('solves p(T, rho) = p and reports Z = p/(rho R T)', () => {
    fc.assert(
      fc.property(temperatures, pressures, (t, p) => {
        const st = stateAt(eos, t, p, newFluidState());
        const pBack = stateAtDensity(eos, t, st.densityMolPerM3, newFluidState()).pressurePa;
        expect(pBack / p).toBeCloseTo(1, 10);
        expect(st.z).toBeCloseTo(p / (st.densityMolPerM3 * 8.314462618 * t), 10);
      }),
    );
  });

  it('gives cp = (dh/dT)_p and cp/T = (ds/dT)_p', () => {
    fc.assert(
      fc.property(temperatures, pressures, (t, p) => {
        const dt = 1e-3 * t;
        const lo = stateAt(eos, t - dt, p, newFluidState());
        const hi = stateAt(eos, t + dt, p, newFluidState());
        const mid = stateAt(eos, t, p, newFluidState());
        expect((hi.enthalpyJPerMol - lo.enthalpyJPerMol) / (2 * dt) / mid.cpJPerMolK).toBeCloseTo(1, 5);
        expect(((hi.entropyJPerMolK - lo.entropyJPerMolK) / (2 * dt)) * (t / mid.cpJPerMolK)).toBeCloseTo(1, 5);
      }),
    );
  });

  it('gives the Joule-Thomson coefficient as -(dh/dp)_T / cp and the speed of sound from (dp/drho)_s', () => {
    const t = 300;
    const p = 2e6;
    const dp = 1e3;
    const mid = stateAt(eos, t, p, newFluidState());
    const lo = stateAt(eos, t, p - dp, newFluidState());
    const hi = stateAt(eos, t, p + dp, newFluidState());
    const dhdp = (hi.enthalpyJPerMol - lo.enthalpyJPerMol) / (2 * dp);
    expect(-dhdp / mid.cpJPerMolK / mid.jouleThomsonKPerPa).toBeCloseTo(1, 6);
    const sHi = stateFromEntropy(eos, p + dp, mid.entropyJPerMolK, t, newFluidState());
    const sLo = stateFromEntropy(eos, p - dp, mid.entropyJPerMolK, t, newFluidState());
    const dpdRhoS = (2 * dp) / (sHi.densityMolPerM3 - sLo.densityMolPerM3);
    const w = Math.sqrt(dpdRhoS / 0.0280134);
    expect(w / mid.speedOfSoundMPerS).toBeCloseTo(1, 6);
  });

  it('round-trips temperature through the entropy and enthalpy solves', () => {
    fc.assert(
      fc.property(temperatures, pressures, fc.double({ min: 0.7, max: 1.4, noNaN: true }), (t, p, guess) => {
        const st = stateAt(eos, t, p, newFluidState());
        expect(stateFromEntropy(eos, p, st.entropyJPerMolK, t * guess, newFluidState()).temperatureK).toBeCloseTo(t, 6);
        expect(stateFromEnthalpy(eos, p, st.enthalpyJPerMol, t * guess, newFluidState()).temperatureK).toBeCloseTo(
          t,
          6,
        );
      }),
    );
  });

  it('follows the isentrope when the polytropic efficiency is 1, and converges as the steps shrink', () => {
    const start = stateAt(eos, 300, 1e6, newFluidState());
    const isentrope = stateFromEntropy(eos, 4e6, start.entropyJPerMolK, 420, newFluidState());
    const path = compressPolytropic(eos, start, 4e6, 1);
    expect(path.end.temperatureK).toBeCloseTo(isentrope.temperatureK, 4);
    // With eta = 1 the head is the isentropic enthalpy rise.
    expect(path.polytropicHeadJPerMol / (isentrope.enthalpyJPerMol - start.enthalpyJPerMol)).toBeCloseTo(1, 7);
    const coarse = compressPolytropic(eos, start, 4e6, 0.78, 12);
    const fine = compressPolytropic(eos, start, 4e6, 0.78, 96);
    expect(Math.abs(coarse.end.temperatureK - fine.end.temperatureK)).toBeLessThan(1e-3);
    // A lossy path ends hotter than the isentrope and has a head equal to eta times its enthalpy rise.
    expect(fine.end.temperatureK).toBeGreaterThan(isentrope.temperatureK);
    expect(fine.polytropicExponent).toBeGreaterThan(1);
  });

  it('finds the vapour root even from a poor starting density', () => {
    const rho = densityAt(eos, 300, 2e6, 'vapour', 1e-3);
    expect(stateAtDensity(eos, 300, rho, newFluidState()).pressurePa / 2e6).toBeCloseTo(1, 9);
  });
});

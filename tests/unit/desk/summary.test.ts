import { describe, expect, it } from 'vitest';
import {
  fixed,
  formatA,
  formatKw,
  formatRating,
  showTemperature,
} from '@/app/_components/sizing-result/quantity-format';
import { buildSummary } from '@/app/(desk)/size/_lib/summary';
import { motorText } from '@/app/(desk)/size/_lib/summary-compressor';
import { calculate, headlineMethod } from '@/lib/engine';
import { compressorRequest, heaterRequest } from './fixtures';

describe('plain-text summary', () => {
  it("carries a heater's headline, figures, every warning, the basis and the preliminary statement", () => {
    const r = calculate(heaterRequest);
    if (r.service !== 'heater') throw new Error('heater expected');
    const text = buildSummary(r, 'si', 'https://desk.example/size?i=1.x');
    const h = r.heater;
    expect(text.split('\n')[0]).toContain('PRELIMINARY');
    expect(text).toContain(`Design heater duty: ${formatKw(h.designDutyKw)} kW`);
    expect(h.selectedRatingKw).not.toBeNull();
    expect(text).toContain(`catalogue rating ${formatRating(h.selectedRatingKw!)} kW`);
    expect(text).toContain(`${formatA(h.electrical.currentA)} A line current`);
    expect(text).toContain(`${formatA(h.electrical.continuousCurrentA)} A for conductors`);
    expect(text).toContain(`Absorbed duty (enthalpy integral): ${formatKw(h.absorbedDutyKw)} kW`);
    expect(text).toContain(`Average-cp estimate: ${formatKw(h.averageCpDutyKw)} kW`);
    for (const w of r.warnings) expect(text).toContain(w.message);
    const preliminary = r.warnings.find((w) => w.code === 'preliminary');
    expect(preliminary).toBeDefined();
    // Said once, as the closing statement, not repeated among the warnings.
    expect(text.split(preliminary!.message).length - 1).toBe(1);
    expect(text).toContain(r.basis.propertySource);
    expect(text).toContain(`${fixed(r.basis.barometricPressureKpa, 3)} kPa`);
    expect(text.trimEnd().endsWith('https://desk.example/size?i=1.x')).toBe(true);
  });

  it("carries a compressor's shaft power, motor, both methods and every stage in the chosen units", () => {
    const r = calculate(compressorRequest);
    if (r.service !== 'compressor') throw new Error('compressor expected');
    const c = r.compressor;
    const text = buildSummary(r, 'us');
    expect(text).toContain(`Shaft power: ${formatKw(c.shaftPowerKw)} kW`);
    expect(text).toContain(motorText(c.motor));
    expect(text).toContain(
      `constant-k ${formatKw(c.constantK.gasPowerKw)} kW, variable-cp ${formatKw(c.variableCp.gasPowerKw)} kW`,
    );
    // The headline method (real gas on the default equation) is the one the summary lists stage by stage.
    for (const s of headlineMethod(c).stages) {
      const t = showTemperature(s.dischargeTemperatureC, 'us');
      expect(t.unit).toBe('°F');
      expect(text).toContain(`Stage ${s.stage}:`);
      expect(text).toContain(`${t.value} °F out`);
    }
    for (const d of headlineMethod(c).intercoolerDutiesKw) expect(text).toContain(`${formatKw(d)} kW`);
    for (const w of r.warnings) expect(text).toContain(w.message);
  });
});

import { extractText } from 'unpdf';
import { describe, expect, it } from 'vitest';
import { getRevisionDownload } from '@/lib/datasheets/download';
import {
  formatAmps,
  formatFigure,
  formatFixed,
  formatKw,
  formatPercent,
  formatRating,
  formatTemperatureC,
} from '@/lib/datasheets/format';
import { issueDatasheet } from '@/lib/datasheets/issue';
import { iecText, nemaText } from '@/lib/datasheets/pdf/compressor-results';
import { ratingText } from '@/lib/datasheets/pdf/heater-results';
import { PRELIMINARY_STATEMENT } from '@/lib/datasheets/pdf/page-frame';
import type { CompressorResult, HeaterResult } from '@/lib/engine';
import { makeEngineSizing, setAccountSite } from '../helpers/datasheet-fixtures';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { airTwoStage, nitrogenHeater } from './requests';

async function issuedText(kind: 'heater' | 'compressor') {
  const account = await makeAccount('Fenwick Maltings');
  await setAccountSite(account.id, 'Kiln house 2, north bay');
  const engineer = await makeUser('sales_engineer');
  const tag = kind === 'heater' ? 'EH-7101' : 'K-7102';
  const sizing = await makeEngineSizing(engineer, account.id, kind === 'heater' ? nitrogenHeater : airTwoStage, {
    title: `Datasheet check ${kind}`,
    tag,
  });
  const issued = await issueDatasheet(engineer, { sizingId: sizing.id });
  const dl = await getRevisionDownload(engineer, issued.revisionId);
  if (dl.status !== 'ok') throw new Error(`download ${dl.status}`);
  const { text, totalPages } = await extractText(new Uint8Array(dl.bytes), { mergePages: true });
  // Lines wrap at spaces only (hyphenation is off), so collapsing whitespace restores every phrase.
  return { account, tag, issued, result: sizing.result, text: text.replace(/\s+/g, ' '), totalPages };
}

describe('a datasheet carries the engine figures of its sizing', () => {
  it('heater: identity, duties, rating, currents and cautions', async () => {
    const { account, tag, issued, result, text, totalPages } = await issuedText('heater');
    const h = (result as HeaterResult).heater;
    expect(issued.revision).toBe('A');
    expect(issued.number).toMatch(/^DS\d{2}-\d{4,}$/);
    for (const s of [`${issued.number} Rev. A`, account.name, 'Kiln house 2, north bay', tag, 'Datasheet check heater'])
      expect(text).toContain(s);
    // The engine itself against the published check value: 81.68 kW [calc from NASA polynomials].
    expect(h.absorbedDutyKw).toBeCloseTo(81.68, 1);
    const figures = [
      formatKw(h.absorbedDutyKw),
      formatKw(h.averageCpDutyKw),
      formatPercent(h.averageCpDifferencePercent),
      formatKw(h.heatLossKw),
      formatKw(h.marginKw),
      formatKw(h.designDutyKw),
      ratingText(h.selectedRatingKw),
      `${formatRating(h.electrical.voltageV)} V, 3-phase`,
      formatAmps(h.electrical.currentA),
      formatAmps(h.electrical.continuousCurrentA),
      `${formatFigure(h.outletActualFlowM3PerH)} m³/h`,
      formatTemperatureC(h.outletTemperatureC),
    ];
    for (const f of figures) expect(text).toContain(f);
    // I = P / (sqrt(3) V) for a balanced three-phase resistive load [calc]; conductors at 125 % [mem: NEC 424.4(B)].
    const expectedA = (h.electrical.powerBasisKw * 1000) / (Math.sqrt(3) * 400);
    expect(text).toContain(formatAmps(expectedA));
    expect(text).toContain(formatAmps(expectedA * 1.25));
    expect(text).toContain('2 barg');
    expect(text).toContain('1000 kg/h');
    for (const w of result.warnings) expect(text).toContain(w.message);
    expect(text).toContain(result.basis.propertySource);
    expect(text.split(PRELIMINARY_STATEMENT).length - 1).toBe(totalPages);
    for (let p = 1; p <= totalPages; p++) expect(text).toContain(`Page ${p} of ${totalPages}`);
    for (const box of ['Prepared', 'Checked', 'Approved']) expect(text.toLowerCase()).toContain(box.toLowerCase());
    expect(text).toMatch(
      /Rev\. Date Description Issued by Status A \d{4}-\d{2}-\d{2} First issue from sizing version 1 Test sales_engineer Current/,
    );
  });

  it('compressor: stages, both methods, coolers, shaft power and motor ratings', async () => {
    const { issued, result, text } = await issuedText('compressor');
    const c = (result as CompressorResult).compressor;
    expect(text).toContain(`${issued.number} Rev. A`);
    // Two ideal stages with intercooling: 203.8 kJ/kg and 101.9 kJ/kg removed [calc: w = cp T1 (r^((k-1)/k) - 1)
    // per stage with k 1.4, cp 1.005 kJ/(kg K), the air values of the standard thermodynamics texts [mem]].
    expect(c.variableCp.specificWorkKjPerKg).toBeCloseTo(203.8, 0);
    expect(c.variableCp.totalIntercoolerDutyKw / result.massFlowKgPerS).toBeCloseTo(101.9, 0);
    for (const st of c.variableCp.stages) {
      for (const f of [
        formatFixed(st.pressureRatio, 3),
        formatFixed(st.dischargeTemperatureC, 1),
        formatFigure(st.specificWorkKjPerKg),
        formatFigure(st.gasPowerKw),
      ])
        expect(text).toContain(f);
    }
    const figures = [
      formatFigure(c.constantK.gasPowerKw),
      formatFigure(c.variableCp.gasPowerKw),
      formatPercent(c.methodDifferencePercent),
      formatFigure(c.constantK.specificWorkKjPerKg),
      formatFigure(c.variableCp.specificWorkKjPerKg),
      formatKw(c.shaftPowerKw),
      ...c.variableCp.intercoolerDutiesKw.map(formatFigure),
      iecText(c.motor.iecKw),
      nemaText(c.motor.nemaHp),
      formatAmps(c.drive!.lineCurrentA),
    ];
    for (const f of figures) expect(text).toContain(f);
    expect(text).toContain(
      c.suggestedStages === null ? 'no count up to 6' : `${c.suggestedStages} (fewest keeping every stage under`,
    );
    for (const w of result.warnings) expect(text).toContain(w.message);
    expect(text).toContain('900 Nm³/h');
  });
});

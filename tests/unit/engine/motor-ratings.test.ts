import { describe, expect, it } from 'vitest';
import { IEC_MOTOR_RATINGS_KW, NEMA_MOTOR_RATINGS_HP, selectMotor } from '@/lib/engine';

describe('standard motor ratings', () => {
  // IEC 60072-1 kW series [mem: IEC 60072-1 rated outputs].
  it.each([0.75, 1.1, 5.5, 18.5, 37, 75, 132, 315, 355, 1000])('%f kW is in the IEC series', (kw) => {
    expect(IEC_MOTOR_RATINGS_KW).toContain(kw);
  });
  it.each([1.2, 6, 100, 125, 300])('%f kW is not an IEC rating', (kw) =>
    expect(IEC_MOTOR_RATINGS_KW).not.toContain(kw),
  );
  // NEMA MG 1 hp series [mem: NEMA MG 1 standard horsepower ratings].
  it.each([1, 1.5, 7.5, 25, 60, 125, 350, 500])('%f hp is in the NEMA series', (hp) =>
    expect(NEMA_MOTOR_RATINGS_HP).toContain(hp),
  );
  it.each([35, 70, 110, 175])('%f hp is not a NEMA rating', (hp) => expect(NEMA_MOTOR_RATINGS_HP).not.toContain(hp));

  it('series are ascending', () => {
    for (const s of [IEC_MOTOR_RATINGS_KW, NEMA_MOTOR_RATINGS_HP]) expect([...s].sort((a, b) => a - b)).toEqual(s);
  });
});

describe('motor selection with at least 10 % margin [mem: API machinery standards]', () => {
  it('100 kW shaft takes 110 kW (exactly 10 %) and 150 hp', () => {
    const m = selectMotor(100);
    expect(m.iecKw).toBe(110);
    expect(m.marginPercent).toBeCloseTo(10, 9);
    expect(m.nemaHp).toBe(150); // 100 kW = 134.1 hp; x 1.1 = 147.5 hp
  });
  it('101 kW shaft moves up to 132 kW', () => expect(selectMotor(101).iecKw).toBe(132));
  it('never picks a rating under 1.1 x shaft power', () => {
    for (let kw = 0.05; kw < 900; kw *= 1.07) {
      const m = selectMotor(kw);
      expect(m.iecKw!).toBeGreaterThanOrEqual(kw * 1.1 * (1 - 1e-9));
      const smaller = IEC_MOTOR_RATINGS_KW.filter((r) => r < m.iecKw!);
      expect(smaller.every((r) => r < kw * 1.1)).toBe(true);
    }
  });
  it('continues past 1000 kW and 500 hp: a 600 kW compressor gets a motor [mem: ISO 3 R20; NEMA MG 1 Part 20]', () => {
    expect(selectMotor(600)).toMatchObject({ iecKw: 710, nemaHp: 900 });
    expect(selectMotor(950)).toMatchObject({ iecKw: 1120, nemaHp: 1500 });
  });

  it('returns null above the series', () => {
    expect(selectMotor(9500)).toMatchObject({ iecKw: null, nemaHp: null });
  });
});

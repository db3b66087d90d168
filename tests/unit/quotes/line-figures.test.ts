import { describe, expect, it } from 'vitest';
import { calculate } from '@/lib/engine';
import { lineFigures } from '@/lib/quotes/line-figures';
import { compressorRequest, heaterRequest, q } from '../engine/requests';

// Conversions checked: 1 lb = 0.45359237 kg exactly and 1 psi = 6.894757 kPa [pub: NIST SP 811 (2008), B.8];
// °F = 1.8 °C + 32 [pub: NIST SP 811, B.9].
describe('quote line figures', () => {
  const heater = calculate(heaterRequest({ flow: q(1000, 'kg/h'), outletTemperature: q(60, 'degC') }));
  const compressor = calculate(
    compressorRequest({ flow: q(3600, 'kg/h'), inlet: { temperature: q(20, 'degC'), pressure: q(101.325, 'kPa') } }),
  );

  it('states a heater line in SI: headline, mass flow, inlet to outlet temperature', () => {
    expect(lineFigures('heater', 412.3, heater, 'si')).toBe('412.3 kW design duty, 1,000 kg/h, 20.0 °C to 60.0 °C');
  });

  it('states a heater line in US customary units for a US account', () => {
    // 1000 kg/h / 0.45359237 = 2204.6 lb/h; 20 °C = 68.0 °F; 60 °C = 140.0 °F.
    expect(lineFigures('heater', 412.3, heater, 'us')).toBe('412.3 kW design duty, 2,205 lb/h, 68.0 °F to 140.0 °F');
  });

  it('states a compressor line with suction and discharge pressure', () => {
    expect(lineFigures('compressor', 186, compressor, 'si')).toBe(
      '186.0 kW shaft power, 3,600 kg/h, 101.3 kPa abs to 800.0 kPa abs',
    );
    // 101.325 kPa = 14.696 psia; 800 kPa = 116.03 psia.
    expect(lineFigures('compressor', 186, compressor, 'us')).toBe(
      '186.0 kW shaft power, 7,937 lb/h, 14.70 psia to 116.0 psia',
    );
  });

  it('falls back to the headline alone for a record without those figures', () => {
    expect(lineFigures('heater', 9.5, { fixture: true }, 'si')).toBe('9.500 kW design duty');
    expect(lineFigures('compressor', 57.24, null, 'us')).toBe('57.24 kW shaft power');
  });
});

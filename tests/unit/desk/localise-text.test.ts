import { describe, expect, it } from 'vitest';
import { localiseText } from '@/app/_components/sizing-result/localise-text';

// Conversions: °F = °C × 1.8 + 32; 1 psi = 6.894757 kPa; 1 lb = 0.45359237 kg (NIST SP 811, appendix B) [pub].
describe('warnings restated in US customary units', () => {
  it('leaves SI text alone', () => {
    const text = 'Stage 2 discharge 151.0 °C exceeds the 150.0 °C limit.';
    expect(localiseText(text, 'si')).toBe(text);
  });

  it('restates temperatures, differences, pressures and flows with sensible figures', () => {
    expect(localiseText('Stage 2 discharge 151.0 °C exceeds the 150.0 °C limit', 'us')).toBe(
      'Stage 2 discharge 303.8 °F exceeds the 302.0 °F limit',
    );
    expect(localiseText('Temperature rise 210.0 K exceeds 200 K', 'us')).toBe(
      'Temperature rise 378.0 °F exceeds 360 °F',
    );
    expect(localiseText('only 2.0 K above its dew point (12.0 °C at 101.325 kPa, Peng-Robinson)', 'us')).toBe(
      'only 3.6 °F above its dew point (53.6 °F at 14.7 psia, Peng-Robinson)',
    );
    expect(localiseText('Pressure parts above 0.5 bar gauge fall under', 'us')).toBe(
      'Pressure parts above 7.252 psig fall under',
    );
    expect(localiseText('condenses 2,500.0 kg/h of liquid', 'us')).toBe('condenses 5,512 lb/h of liquid');
    expect(localiseText('at up to 20.0 MPa', 'us')).toBe('at up to 2,901 psia');
  });

  it('leaves ranges and units without a figure alone', () => {
    const text = "lies in GERG-2008's extended range (60-700 K, to 70 MPa); cp 1005.00 J/(kg K)";
    expect(localiseText(text, 'us')).toBe(
      "lies in GERG-2008's extended range (60-700 K, to 10,150 psia); cp 1005.00 J/(kg K)",
    );
  });
});

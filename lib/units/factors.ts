import convert from 'convert-units';

// Plain factors, computed once at module load so hot paths multiply by numbers.
// Metric factors come from convert-units. Its imperial factors are rounded to about six figures
// (1 lb = 0.453592 kg, 1 psi = 6.89476 kPa), so the exact definitions of NIST SP 811 (2008),
// Appendix B, are used for the imperial units instead [pub].

function cu(value: number, from: string, to: string): number {
  // The library's unit names are a string union in its types; the names used below are all valid.
  return convert(value)
    .from(from as convert.Unit)
    .to(to as convert.Unit);
}

export const PA_PER_KPA = cu(1, 'kPa', 'Pa');
export const PA_PER_MPA = cu(1, 'MPa', 'Pa');
export const PA_PER_BAR = cu(1, 'bar', 'Pa');
export const KG_PER_TONNE = cu(1, 'mt', 'kg');
export const SECONDS_PER_HOUR = 1 / cu(1, 'm3/h', 'm3/s');
export const W_PER_KW = cu(1, 'kW', 'W');
export const W_PER_MW = cu(1, 'MW', 'W');

/** 1 lb = 0.45359237 kg, exact [pub: NIST SP 811]. */
export const KG_PER_LB = 0.45359237;
/** Standard gravity, m/s2, exact [pub: NIST SP 811]. */
export const STANDARD_GRAVITY = 9.80665;
/** 1 psi = 1 lbf/in2 = 6894.757 Pa (from the exact lb, gn and inch) [pub: NIST SP 811]. */
export const PA_PER_PSI = (KG_PER_LB * STANDARD_GRAVITY) / (0.0254 * 0.0254);
/** 1 ft3 = 0.028316846592 m3, exact [pub: NIST SP 811]. */
export const M3_PER_FT3 = 0.028316846592;
/** 1 hp (550 ft lbf/s) = 745.6999 W [pub: NIST SP 811]. */
export const W_PER_HP = 550 * 0.3048 * KG_PER_LB * STANDARD_GRAVITY;
/** 1 Btu_IT/h = 0.2930711 W [pub: NIST SP 811]. */
export const W_PER_BTU_PER_H = 1055.05585262 / 3600;
/** J/(kg K) per Btu/(lb °F), exact [pub: NIST SP 811 (2008), B.8, International Table Btu]. */
export const J_PER_KG_K_PER_BTU_PER_LB_F = 4186.8;

/**
 * Linear map unit -> kelvin (K = slope * value + offset), taken from convert-units over a 1000-degree
 * span; rounding strips the library's floating-point noise (e.g. a -6e-14 K offset for degR).
 */
function kelvinMap(unit: string): { slope: number; offset: number } {
  const offset = cu(0, unit, 'K');
  const slope = (cu(1000, unit, 'K') - offset) / 1000;
  return { slope: Number(slope.toPrecision(14)), offset: Math.round(offset * 1e12) / 1e12 };
}

export const KELVIN_MAPS = {
  degC: kelvinMap('C'),
  degF: kelvinMap('F'),
  K: kelvinMap('K'),
  degR: kelvinMap('R'),
} as const;

/** Molar gas constant, J/(mol K); exact since the 2019 SI redefinition [pub: CODATA 2018]. */
export const GAS_CONSTANT_J_PER_MOL_K = 8.314462618;

/** Lower and upper temperature limits of every NASA 7-coefficient set used here [pub: NASA TM-4513]. */
export const MIN_TEMPERATURE_K = 200;
export const MAX_TEMPERATURE_K = 6000;

/** Common range boundary of all the sets, which is what lets mixtures collapse to one polynomial. */
export const MID_TEMPERATURE_K = 1000;

/** Reference pressure of the standard-state entropy s°, Pa (1 bar) [pub: NASA TM-4513]. */
export const STANDARD_STATE_PRESSURE_PA = 100_000;

export const ZERO_CELSIUS_K = 273.15;

/** The one-line property-basis statement printed on datasheets. */
export const PROPERTY_SOURCE =
  'Ideal gas; NASA 7-coefficient polynomials, 200-1000-6000 K (McBride, Gordon & Reno, NASA TM-4513, 1993; ' +
  'n-pentane, isopentane, n-hexane, n-nonane, n-decane and H2S from Burcat & Ruscic, ANL-05/20, 2005); ' +
  'R = 8.314462618 J/(mol K) (CODATA 2018); molar masses from CIAAW 2021 standard atomic weights';

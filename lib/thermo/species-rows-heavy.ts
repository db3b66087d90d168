import type { SpeciesRow } from './species-data';

/*
 * C4-C10 alkanes and hydrogen sulfide: the species GERG-2008 covers beyond the light gases.
 *
 * The butanes, n-heptane and n-octane are [pub: McBride, Gordon & Reno, NASA TM-4513 (1993)], transcribed from
 * Cantera's data/nasa_gas.yaml like the light gases. That file's n-pentane and isopentane sets start at
 * 298.15 K and end at 5000 K, and it has no n-hexane, n-nonane, n-decane, nor an H2S set below 300 K; a
 * mixture folds into one polynomial only if every set spans 200-1000-6000 K, and refitting is not done here,
 * so those six come from [pub: Burcat & Ruscic, "Third Millennium Ideal Gas and Condensed Phase
 * Thermochemical Database", ANL-05/20 and TAE 960 (2005)] in NASA 7-term form, 200-1000-6000 K, read from the
 * 2005 edition's BURCAT.THR. Each row names the data behind its fit. (The 2015 edition replaced n-pentane and
 * n-nonane with computed sets whose cp at 298 K is 7-11 % below the measured values; the 2005 sets are kept.)
 *
 * Checked in tests/unit/thermo/heavy-species.test.ts: continuity at 1000 K, cp and h against the GERG-2008
 * ideal-gas equations, cp against TRC values and H2S against NIST-JANAF.
 */
const NASA_TM4513 = 'NASA TM-4513 (McBride, Gordon & Reno 1993)';
const BURCAT = 'Burcat & Ruscic, ANL-05/20 (2005)';

export const HEAVY_ROWS: readonly SpeciesRow[] = [
  {
    id: 'n-C4H10',
    name: 'n-butane',
    atoms: { C: 4, H: 10 },
    source: NASA_TM4513,
    low: [6.14746806, 1.55947389e-4, 9.67913517e-5, -1.2548391e-7, 4.97816555e-11, -17599.4402, -1.09409879],
    high: [9.44535834, 0.0257858073, -9.23619122e-6, 1.48632755e-9, -8.87897158e-14, -20138.2165, -26.3470076],
  },
  {
    id: 'i-C4H10',
    name: 'isobutane',
    atoms: { C: 4, H: 10 },
    source: NASA_TM4513,
    low: [4.45479276, 8.26057985e-3, 8.29886664e-5, -1.14647642e-7, 4.64570101e-11, -18459.3931, 4.92743175],
    high: [9.76991245, 0.025499721, -9.14142932e-6, 1.47328271e-9, -8.80800188e-14, -21405.2647, -30.0329101],
  },
  {
    id: 'n-C5H12',
    name: 'n-pentane',
    atoms: { C: 5, H: 12 },
    // "n10/85": TRC (Oct 1985) data to 1500 K, extrapolated with Wilhoit's polynomials; HF298 -146.76 kJ/mol.
    source: `${BURCAT} (TRC 1985 data)`,
    low: [8.54851659, -8.88170492e-3, 1.4308389e-4, -1.78592329e-7, 6.97489761e-11, -20749.2614, -8.93518255],
    high: [16.73727, 0.0223922034, -6.17705543e-6, 1.02144924e-9, -6.65183115e-14, -25761.6661, -64.5619087],
  },
  {
    id: 'i-C5H12',
    name: 'isopentane',
    atoms: { C: 5, H: 12 },
    // "P10/85": TRC (Oct 1985) data extrapolated with Wilhoit's polynomials; HF298 -153.7 kJ/mol.
    source: `${BURCAT} (TRC 1985 data)`,
    low: [2.19440218, 0.0361717165, 3.01586516e-5, -5.87986428e-8, 2.47059837e-11, -20909.7364, 17.185155],
    high: [10.481631, 0.0342018698, -1.20571041e-5, 1.91951808e-9, -1.13803609e-13, -24355.7061, -31.0177093],
  },
  {
    id: 'n-C6H14',
    name: 'n-hexane',
    atoms: { C: 6, H: 14 },
    // "g 6/01": NASA Glenn (McBride) fit of TRC 1985 data; HF298 -166.92 kJ/mol.
    source: `${BURCAT} (NASA Glenn fit of TRC 1985 data)`,
    low: [9.87121167, -9.36699002e-3, 1.69887865e-4, -2.1501952e-7, 8.45407091e-11, -23718.5495, -12.4999353],
    high: [19.5158086, 0.0267753942, -7.49783741e-6, 1.19510646e-9, -7.51957473e-14, -29436.2466, -77.4895497],
  },
  {
    id: 'n-C7H16',
    name: 'n-heptane',
    atoms: { C: 7, H: 16 },
    source: NASA_TM4513,
    low: [11.1532484, -9.49415433e-3, 1.95571181e-4, -2.4975252e-7, 9.84873213e-11, -26771.1735, -15.909611],
    high: [18.5354704, 0.0391420468, -1.38030268e-5, 2.22403874e-9, -1.3345258e-13, -31950.0783, -70.190284],
  },
  {
    id: 'n-C8H18',
    name: 'n-octane',
    atoms: { C: 8, H: 18 },
    source: NASA_TM4513,
    low: [12.5244908, -0.0101018365, 2.21991595e-4, -2.8486242e-7, 1.12409624e-10, -29843.3034, -19.7108554],
    high: [22.1755407, 0.0424426161, -1.49161103e-5, 2.40376673e-9, -1.44359037e-13, -36103.0944, -88.0854457],
  },
  {
    id: 'n-C9H20',
    name: 'n-nonane',
    atoms: { C: 9, H: 20 },
    // "T 5/99": U.S. Bureau of Mines Bull. 666 (1974) data to 1500 K, Wilhoit extrapolation; HF298 -54.71 kcal/mol.
    source: `${BURCAT} (Bureau of Mines Bull. 666 data)`,
    low: [13.9840225, -0.0117224978, 2.52316467e-4, -3.25680364e-7, 1.29109135e-10, -32825.8409, -23.863375],
    high: [25.5877522, 0.0460770651, -1.60860633e-5, 2.58274408e-9, -1.5473469e-13, -40074.8448, -104.722466],
  },
  {
    id: 'n-C10H22',
    name: 'n-decane',
    atoms: { C: 10, H: 22 },
    // "T 5/99": U.S. Bureau of Mines Bull. 666 (1974) data to 1500 K, Wilhoit extrapolation; HF298 -59.64 kcal/mol.
    source: `${BURCAT} (Bureau of Mines Bull. 666 data)`,
    low: [15.4328173, -0.0132979232, 2.82480581e-4, -3.65923298e-7, 1.45372117e-10, -35863.2831, -27.9454341],
    high: [29.4782956, 0.0490518943, -1.70317179e-5, 2.729193e-9, -1.63370772e-13, -44302.2624, -124.062121],
  },
  {
    id: 'H2S',
    name: 'hydrogen sulfide',
    atoms: { H: 2, S: 1 },
    // "RUS 89": computed from the Gurvich et al. (1989) tables; HF298 -20.60 kJ/mol.
    source: `${BURCAT} (Gurvich 1989 tables)`,
    low: [4.1194112, -1.8771599e-3, 8.2066045e-6, -7.0594243e-9, 2.1405829e-12, -3681.9294, 1.5345832],
    high: [2.9770813, 3.6005325e-3, -1.2328487e-6, 1.9692654e-10, -1.1677327e-14, -3515.597, 6.786834],
  },
];

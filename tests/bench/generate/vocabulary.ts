// Invented words the generated sizings are made of: customer names, titles, notes and tag prefixes.
// Every name is made up for the benchmark; none stands for a real company.

const namePrefixes = ['Bryn', 'Cal', 'Dorn', 'Elv', 'Frel', 'Gorm', 'Hask', 'Ivr', 'Jorv', 'Kelm'];
const nameSuffixes = ['mere', 'holt', 'stead', 'wyn'];
const trades = [
  'Polymers',
  'Chemicals',
  'Foods',
  'Glassworks',
  'Metals',
  'Pharma',
  'Biogas',
  'Ceramics',
  'Paper',
  'Energy',
];

/** 400 distinct customer names: ten of each invented place, one per trade. */
export const customerNames: string[] = namePrefixes.flatMap((p) =>
  nameSuffixes.flatMap((s) => trades.map((t) => `${p}${s} ${t}`)),
);

/** Where on the site the equipment sits. */
export const areas = [
  'kiln',
  'dryer',
  'reformer',
  'furnace',
  'oven',
  'digester',
  'absorber',
  'column',
  'spray dryer',
  'tunnel dryer',
  'calciner',
  'granulator',
  'extruder',
  'annealing lehr',
  'curing oven',
  'fluid bed',
  'regenerator',
  'stripper',
  'mill',
  'cooler',
];

/** What the duty is for. */
export const purposes = [
  'regeneration',
  'purge',
  'preheat',
  'sweep gas',
  'backfill',
  'recycle',
  'booster',
  'instrument air',
  'vent',
  'flare',
  'superheat',
  'carrier gas',
  'blanketing',
  'drying air',
  'start-up',
  'combustion air',
  'feed',
  'transfer',
  'make-up',
  'tail gas',
];

/** Sentences engineers leave in the notes of about half the sizings. */
export const noteSentences = [
  'Customer asked for a stainless sheath and a separate terminal box.',
  'Duty checked against the site barometric pressure.',
  'Revised after the site survey; flow confirmed by the operator.',
  'Hazardous area zone 2; enclosure rating to be confirmed.',
  'Spare capacity requested for a future production line.',
  'Inlet filter upstream; allow for its pressure drop.',
  'Discharge temperature close to the seal limit, consider intercooling.',
  'Budget enquiry only, no delivery date yet.',
  'Replaces an existing unit of the same rating.',
  'Thyristor control requested with a ramp on start.',
  'Noise limit of 80 dBA at one metre specified by the client.',
  'Oxygen service cleaning required for all wetted parts.',
  'Condensate drain needed at the lowest point.',
  'Winterisation and trace heating to be quoted separately.',
  'Motor to suit a variable speed drive.',
  'Existing foundation must be reused.',
];

/** Letters that open an equipment tag. */
export const tagPrefixes = ['EH', 'E', 'H', 'K', 'C', 'KM', 'HX', 'B'];

// The invented demo scenario: Halvard Thermal Systems, a fictional heater and compressor vendor,
// and three fictional customers. Every name, site and equipment tag here is made up.
import type { UserRole } from './schema/enums';

export type SeedUser = { email: string; name: string; role: UserRole; account?: string };
export type SeedSizing = {
  account: string;
  title: string;
  tag: string;
  notes?: string;
  by: string;
  input: Record<string, unknown>;
};
export type SeedQuote = {
  account: string;
  title: string;
  status: 'draft' | 'sent' | 'won' | 'lost';
  by: string;
  /** Unit prices in the account's currency (decimal strings), set while the quote is a draft. */
  lines: { tag: string; quantity: number; unitPrice?: string }[];
  notes?: string;
};

export const seedAccounts = [
  {
    key: 'tarnside',
    name: 'Tarnside Polymers',
    site: 'Tarnside Works, compounding line 3',
    billingContactName: 'Olu Bennet',
    billingContactEmail: 'olu.bennet@tarnside.example',
    barometricPressureKpa: 100.8,
  },
  {
    key: 'greyfen',
    name: 'Greyfen Biogas',
    site: 'Greyfen anaerobic digestion plant',
    billingContactName: 'Marta Quill',
    billingContactEmail: 'marta.quill@greyfen.example',
    siteAltitudeM: 240,
  },
  {
    key: 'oakhollow',
    name: 'Oakhollow Glassworks',
    site: 'Oakhollow furnace hall B',
    billingContactName: 'Dev Hartigan',
    billingContactEmail: 'dev.hartigan@oakhollow.example',
    barometricPressureKpa: 101.325,
    // A US customary customer: its desk defaults, datasheets and e-mails read in °F, psia and lb/h.
    unitSystem: 'us',
  },
] as const;

export const seedUsers: SeedUser[] = [
  { email: 'ines.marlow@halvard.example', name: 'Ines Marlow', role: 'sales_engineer' },
  { email: 'tobias.rennick@halvard.example', name: 'Tobias Rennick', role: 'sales_engineer' },
  { email: 'priya.caldwell@halvard.example', name: 'Priya Caldwell', role: 'support' },
  { email: 'admin@halvard.example', name: 'Sam Ferris', role: 'admin' },
  { email: 'olu.bennet@tarnside.example', name: 'Olu Bennet', role: 'customer', account: 'tarnside' },
  { email: 'marta.quill@greyfen.example', name: 'Marta Quill', role: 'customer', account: 'greyfen' },
  { email: 'dev.hartigan@oakhollow.example', name: 'Dev Hartigan', role: 'customer', account: 'oakhollow' },
];

const q = (value: number, unit: string) => ({ value, unit });

export const seedSizings: SeedSizing[] = [
  {
    account: 'tarnside',
    title: 'Pellet dryer air heater',
    tag: 'EH-301',
    by: 'ines.marlow@halvard.example',
    notes: 'Enquiry 14 Feb: dryer inlet air, 3 barg header.',
    input: {
      service: 'heater',
      gas: { preset: 'air' },
      flow: q(2000, 'kg/h'),
      inlet: { temperature: q(15, 'degC'), pressure: q(3, 'barg') },
      outletTemperature: q(320, 'degC'),
      heatLossPercent: 5,
      designMarginPercent: 10,
      supply: { voltageV: 400, phases: 3 },
    },
  },
  {
    account: 'tarnside',
    title: 'Nitrogen purge heater',
    tag: 'EH-305',
    by: 'ines.marlow@halvard.example',
    input: {
      service: 'heater',
      gas: { preset: 'nitrogen' },
      flow: q(1000, 'kg/h'),
      inlet: { temperature: q(20, 'degC'), pressure: q(500, 'kPa') },
      outletTemperature: q(300, 'degC'),
      heatLossPercent: 3,
      designMarginPercent: 15,
      supply: { voltageV: 400, phases: 3 },
    },
  },
  {
    account: 'tarnside',
    title: 'Conveying air compressor',
    tag: 'K-110',
    by: 'tobias.rennick@halvard.example',
    input: {
      service: 'compressor',
      gas: { preset: 'air' },
      flow: q(1200, 'Nm3/h'),
      inlet: { temperature: q(25, 'degC'), pressure: q(101.325, 'kPa') },
      dischargePressure: q(8, 'barg'),
      isentropicEfficiency: 0.78,
      stages: 2,
      intercoolerOutletTemperature: q(35, 'degC'),
      method: 'variable-cp',
    },
  },
  {
    account: 'greyfen',
    title: 'Biogas booster to CHP',
    tag: 'K-201',
    by: 'tobias.rennick@halvard.example',
    notes: 'Raw biogas after H2S removal; composition from site analysis.',
    input: {
      service: 'compressor',
      gas: { components: { CH4: 0.6, CO2: 0.38, N2: 0.02 } },
      flow: q(450, 'Nm3/h'),
      inlet: { temperature: q(30, 'degC'), pressure: q(1.02, 'bar') },
      dischargePressure: q(6, 'bar'),
      polytropicEfficiency: 0.8,
      stages: 2,
      intercoolerOutletTemperature: q(40, 'degC'),
      method: 'variable-cp',
    },
  },
  {
    account: 'greyfen',
    title: 'Digester gas dew-point heater',
    tag: 'E-210',
    by: 'tobias.rennick@halvard.example',
    input: {
      service: 'heater',
      gas: { components: { CH4: 0.6, CO2: 0.38, N2: 0.02 } },
      flow: q(450, 'Nm3/h'),
      inlet: { temperature: q(8, 'degC'), pressure: q(120, 'kPa') },
      outletTemperature: q(25, 'degC'),
      heatLossPercent: 5,
      designMarginPercent: 20,
      supply: { voltageV: 230, phases: 1 },
    },
  },
  {
    account: 'oakhollow',
    title: 'Combustion air preheater',
    tag: 'EH-410',
    by: 'ines.marlow@halvard.example',
    input: {
      service: 'heater',
      gas: { preset: 'humid-air', relativeHumidityPercent: 60 },
      flow: q(5400, 'SCFM'),
      inlet: { temperature: q(59, 'degF'), pressure: q(14.696, 'psia') },
      outletTemperature: q(750, 'degF'),
      heatLossPercent: 4,
      designMarginPercent: 10,
      supply: { voltageV: 480, phases: 3 },
    },
  },
  {
    account: 'oakhollow',
    title: 'Nitrogen backfill compressor',
    tag: 'K-420',
    by: 'ines.marlow@halvard.example',
    input: {
      service: 'compressor',
      gas: { preset: 'nitrogen' },
      flow: q(1500, 'Nm3/h'),
      inlet: { temperature: q(20, 'degC'), pressure: q(1, 'bar') },
      dischargePressure: q(30, 'bar'),
      isentropicEfficiency: 0.8,
      stages: 3,
      intercoolerOutletTemperature: q(35, 'degC'),
      interstagePressureDropPercent: 1.5,
      method: 'variable-cp',
    },
  },
];

export const seedQuotes: SeedQuote[] = [
  {
    account: 'tarnside',
    title: 'Line 3 dryer and purge heaters',
    status: 'sent',
    by: 'ines.marlow@halvard.example',
    lines: [
      { tag: 'EH-301', quantity: 1, unitPrice: '48200.00' },
      { tag: 'EH-305', quantity: 2, unitPrice: '12650.00' },
    ],
  },
  {
    account: 'greyfen',
    title: 'CHP gas train',
    status: 'draft',
    by: 'tobias.rennick@halvard.example',
    lines: [
      { tag: 'K-201', quantity: 1 },
      { tag: 'E-210', quantity: 1 },
    ],
  },
  {
    account: 'oakhollow',
    title: 'Furnace hall B utilities',
    status: 'won',
    by: 'ines.marlow@halvard.example',
    lines: [
      { tag: 'EH-410', quantity: 1 },
      { tag: 'K-420', quantity: 1 },
    ],
  },
];

/**
 * Datasheets issued in the scenario: tag, issuer and a note per revision (one entry per revision). `revise` saves a
 * new version of the sizing (same record, same datasheet) before the revision of that index is issued.
 */
export const seedDatasheets: {
  tag: string;
  by: string;
  notes: string[];
  revise?: { before: number; notes: string; change: Record<string, unknown> };
}[] = [
  {
    tag: 'EH-301',
    by: 'ines.marlow@halvard.example',
    notes: ['Issued for quotation', 'Heat-loss allowance confirmed with the customer'],
    revise: {
      before: 1,
      notes: 'Enquiry 14 Feb: dryer inlet air, 3 barg header. Heat loss raised to 8 % after the site survey.',
      change: { heatLossPercent: 8 },
    },
  },
  { tag: 'K-201', by: 'tobias.rennick@halvard.example', notes: ['Issued for quotation'] },
  { tag: 'EH-410', by: 'ines.marlow@halvard.example', notes: ['Issued for order'] },
];

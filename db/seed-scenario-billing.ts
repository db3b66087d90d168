// Three more invented customers of the scenario, one per subscription state the demo shows: Cobbleford Maltings pays
// (datasheets unlocked), Wrayburn Kilnworks' last renewal failed and it is within its grace period, Lowmere Water has
// never subscribed. Their users are used by no other journey, so a visitor or a test can rely on each state.
// db/seed.ts adds them with the rest of the scenario; db/seed-billing.ts gives them their subscriptions.
import type { DemoBillingState } from './demo-billing';
import type { SeedSizing, SeedUser, seedDatasheets } from './seed-scenario';

export const billingAccounts = [
  {
    key: 'cobbleford',
    name: 'Cobbleford Maltings',
    site: 'Cobbleford maltings, fermentation gas recovery',
    billingContactName: 'Aster Penhallow',
    billingContactEmail: 'aster.penhallow@cobbleford.example',
  },
  {
    key: 'wrayburn',
    name: 'Wrayburn Kilnworks',
    site: 'Wrayburn tunnel kiln 2',
    billingContactName: 'Ludo Sarratt',
    billingContactEmail: 'ludo.sarratt@wrayburn.example',
  },
  {
    key: 'lowmere',
    name: 'Lowmere Water',
    site: 'Lowmere sludge treatment centre',
    billingContactName: 'Nell Oyelaran',
    billingContactEmail: 'nell.oyelaran@lowmere.example',
  },
] as const;

/** The state each account is given (and kept in) on every demo start. */
export const billingStates: Record<(typeof billingAccounts)[number]['key'], DemoBillingState> = {
  cobbleford: 'active',
  wrayburn: 'past_due',
  lowmere: 'never',
};

export const billingUsers: SeedUser[] = [
  { email: 'aster.penhallow@cobbleford.example', name: 'Aster Penhallow', role: 'customer', account: 'cobbleford' },
  { email: 'ludo.sarratt@wrayburn.example', name: 'Ludo Sarratt', role: 'customer', account: 'wrayburn' },
  { email: 'nell.oyelaran@lowmere.example', name: 'Nell Oyelaran', role: 'customer', account: 'lowmere' },
];

const q = (value: number, unit: string) => ({ value, unit });

export const billingSizings: SeedSizing[] = [
  {
    account: 'cobbleford',
    title: 'Fermentation CO2 recovery compressor',
    tag: 'K-610',
    by: 'tobias.rennick@halvard.example',
    input: {
      service: 'compressor',
      gas: { preset: 'carbon-dioxide' },
      flow: q(250, 'kg/h'),
      inlet: { temperature: q(20, 'degC'), pressure: q(1.05, 'bar') },
      dischargePressure: q(18, 'bar'),
      isentropicEfficiency: 0.75,
      stages: 2,
      intercoolerOutletTemperature: q(30, 'degC'),
      method: 'variable-cp',
    },
  },
  {
    account: 'wrayburn',
    title: 'Kiln burner gas preheater',
    tag: 'E-620',
    by: 'ines.marlow@halvard.example',
    input: {
      service: 'heater',
      gas: { preset: 'natural-gas' },
      flow: q(300, 'Nm3/h'),
      inlet: { temperature: q(5, 'degC'), pressure: q(4, 'barg') },
      outletTemperature: q(40, 'degC'),
      heatLossPercent: 5,
      designMarginPercent: 15,
      supply: { voltageV: 400, phases: 3 },
    },
  },
  {
    account: 'lowmere',
    title: 'Sludge dryer inerting nitrogen heater',
    tag: 'E-630',
    by: 'ines.marlow@halvard.example',
    input: {
      service: 'heater',
      gas: { preset: 'nitrogen' },
      flow: q(400, 'kg/h'),
      inlet: { temperature: q(15, 'degC'), pressure: q(2, 'barg') },
      outletTemperature: q(180, 'degC'),
      heatLossPercent: 5,
      designMarginPercent: 10,
      supply: { voltageV: 400, phases: 3 },
    },
  },
];

export const billingDatasheets: typeof seedDatasheets = [
  { tag: 'K-610', by: 'tobias.rennick@halvard.example', notes: ['Issued for quotation'] },
  { tag: 'E-620', by: 'ines.marlow@halvard.example', notes: ['Issued for quotation'] },
  { tag: 'E-630', by: 'ines.marlow@halvard.example', notes: ['Issued for quotation'] },
];

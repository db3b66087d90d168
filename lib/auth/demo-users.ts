// The invented demo scenario's sign-ins (Halvard Thermal Systems, an invented vendor). Demo only:
// the seed refuses to run against a database that has non-demo users, and these are shown only
// when the local identity is active.
export const DEMO_PASSWORD = 'dutywise-demo';

export const demoSignIns = [
  { label: 'Sales engineer', email: 'ines.marlow@halvard.example', password: DEMO_PASSWORD },
  { label: 'Sales engineer', email: 'tobias.rennick@halvard.example', password: DEMO_PASSWORD },
  { label: 'Support', email: 'priya.caldwell@halvard.example', password: DEMO_PASSWORD },
  { label: 'Admin', email: 'admin@halvard.example', password: DEMO_PASSWORD },
  { label: 'Customer (Tarnside Polymers)', email: 'olu.bennet@tarnside.example', password: DEMO_PASSWORD },
  { label: 'Customer (Greyfen Biogas)', email: 'marta.quill@greyfen.example', password: DEMO_PASSWORD },
  { label: 'Customer (Oakhollow Glassworks)', email: 'dev.hartigan@oakhollow.example', password: DEMO_PASSWORD },
  // One customer per subscription state (db/seed-scenario-billing.ts), labelled with the state Dutywise shows them.
  {
    label: 'Customer, subscription active (Cobbleford Maltings)',
    email: 'aster.penhallow@cobbleford.example',
    password: DEMO_PASSWORD,
  },
  {
    label: 'Customer, payment failed (Wrayburn Kilnworks)',
    email: 'ludo.sarratt@wrayburn.example',
    password: DEMO_PASSWORD,
  },
  {
    label: 'Customer, no subscription (Lowmere Water)',
    email: 'nell.oyelaran@lowmere.example',
    password: DEMO_PASSWORD,
  },
] as const;

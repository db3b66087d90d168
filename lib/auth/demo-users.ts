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
] as const;

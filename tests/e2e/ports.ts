// Ports of the stack the browser journeys start; distinct from the demo's so both can run at once.
// TEST_PORT_OFFSET (default 0) shifts every test port, so two checkouts can run their suites side by side.
const offset = Number(process.env.TEST_PORT_OFFSET ?? 0) || 0;
export const e2ePorts = {
  app: 3100 + offset,
  secondApp: 3101 + offset,
  /** Production-start checks start (and stop) short-lived servers here. */
  probe: 3150 + offset,
  stripe: 12211 + offset,
  smtp: 12125 + offset,
  smtpHttp: 12126 + offset,
  /** An app of its own on a private PostgreSQL that the database-down journey stops and restarts. */
  faultApp: 3400 + offset,
  faultDb: 56900 + offset,
} as const;
export const e2eBaseUrl = `http://localhost:${e2ePorts.app}`;
/** A second app instance on the same database, for the scale-out journey. */
export const e2eSecondUrl = `http://localhost:${e2ePorts.secondApp}`;

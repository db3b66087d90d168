// Ports of the stack the browser journeys start; distinct from the demo's so both can run at once.
export const e2ePorts = { app: 3100, secondApp: 3101, stripe: 12211, smtp: 12125, smtpHttp: 12126 } as const;
export const e2eBaseUrl = `http://localhost:${e2ePorts.app}`;
/** A second app instance on the same database, for the scale-out journey. */
export const e2eSecondUrl = `http://localhost:${e2ePorts.secondApp}`;

import { listenInboxApi } from './http-api';
import { MessageStore, type StoredMessage } from './message-store';
import { listenSmtp, type SmtpListener } from './smtp-listener';

export type { StoredMessage } from './message-store';

export type SmtpFakeOptions = {
  /** 0 picks a free port; read the chosen one from the handle. */
  smtpPort: number;
  httpPort: number;
  /** Loopback by default, so the fake never accepts mail from other machines. */
  host?: string;
  /** JSON file that keeps received mail across restarts; memory only when absent. */
  statePath?: string;
  log?: (line: string) => void;
};

export type SmtpFakeHandle = {
  smtpPort: number;
  httpPort: number;
  /** Base URL of the inbox API, e.g. http://127.0.0.1:12026. */
  httpUrl: string;
  messages(): StoredMessage[];
  clear(): void;
  /** Stops accepting SMTP connections (the inbox API stays up), for outage tests. */
  stopSmtp(): Promise<void>;
  /** Listens for SMTP again on the same port. */
  startSmtp(): Promise<void>;
  close(): Promise<void>;
};

function checkPort(value: number, name: string): void {
  if (!Number.isInteger(value) || value < 0 || value > 65_535)
    throw new Error(`SMTP fake: ${name} must be an integer from 0 to 65535, got ${value}`);
}

/** Starts the SMTP fake and its inbox API; stoppable and restartable on the same ports. */
export async function startSmtpFake(options: SmtpFakeOptions): Promise<SmtpFakeHandle> {
  checkPort(options.smtpPort, 'smtpPort');
  checkPort(options.httpPort, 'httpPort');
  const host = options.host ?? '127.0.0.1';
  const log = options.log ?? ((line: string) => console.warn(`[smtp-fake] ${line}`));
  const store = new MessageStore(options.statePath);
  let smtp: SmtpListener | null = await listenSmtp({ port: options.smtpPort, host, store, log });
  const smtpPort = smtp.port;
  const api = await listenInboxApi({ port: options.httpPort, host, store, smtpUp: () => smtp !== null });

  const stopSmtp = async () => {
    const current = smtp;
    smtp = null;
    if (current) await current.close();
  };
  return {
    smtpPort,
    httpPort: api.port,
    httpUrl: `http://${host}:${api.port}`,
    messages: () => store.list(),
    clear: () => void store.clear(),
    stopSmtp,
    startSmtp: async () => {
      if (!smtp) smtp = await listenSmtp({ port: smtpPort, host, store, log });
    },
    close: async () => {
      await Promise.all([stopSmtp(), api.close()]);
    },
  };
}

import { SMTPServer } from 'smtp-server';
import type { MessageStore } from './message-store';
import { parseMessage } from './parse-message';

export type SmtpListener = { port: number; close(): Promise<void> };

// Well above any datasheet attachment Dutywise sends; larger mail is refused with a 552.
const MAX_MESSAGE_BYTES = 25 * 1024 * 1024;

/**
 * Plain SMTP on loopback: no TLS, STARTTLS not offered, any AUTH accepted (or none), so the
 * app's transport works with or without credentials.
 */
export async function listenSmtp(options: {
  port: number;
  host: string;
  store: MessageStore;
  log: (line: string) => void;
}): Promise<SmtpListener> {
  const server = new SMTPServer({
    secure: false,
    disabledCommands: ['STARTTLS'],
    authOptional: true,
    allowInsecureAuth: true,
    banner: 'Dutywise local mail fake',
    size: MAX_MESSAGE_BYTES,
    logger: false,
    // Clients are local; a reverse DNS lookup per connection only adds delay (or hangs offline).
    disableReverseLookup: true,
    // Fault tests stop the fake mid-send; open sessions are told 421 quickly instead of after 30 s.
    closeTimeout: 250,
    onAuth(auth, _session, callback) {
      callback(null, { user: auth.username ?? 'anonymous' });
    },
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('error', (error) => callback(error));
      stream.on('end', () => {
        const envelope = {
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : null,
          to: session.envelope.rcptTo.map((rcpt) => rcpt.address),
        };
        parseMessage(Buffer.concat(chunks), envelope)
          .then((message) => {
            options.store.add(message);
            callback();
          })
          .catch((error: Error) => {
            options.log(`could not parse a message: ${error.message}`);
            callback(error);
          });
      });
    },
  });
  server.on('error', (error) => options.log(`smtp error: ${error.message}`));
  await new Promise<void>((resolve, reject) => {
    server.server.once('error', reject);
    server.listen(options.port, options.host, () => {
      server.server.off('error', reject);
      resolve();
    });
  });
  const address = server.server.address();
  const port = typeof address === 'object' && address ? address.port : options.port;
  return {
    port,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

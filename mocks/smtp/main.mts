// Runs the local SMTP fake on its own: `npx tsx mocks/smtp/main.mts`.
import { smtpFakeOptionsFromEnv } from './env-options';
import { startSmtpFake } from './server';

const fake = await startSmtpFake(smtpFakeOptionsFromEnv(process.env));
console.log(`smtp fake: SMTP 127.0.0.1:${fake.smtpPort}, inbox ${fake.httpUrl}`);

const stop = async (signal: string) => {
  console.log(`smtp fake: ${signal}, stopping`);
  await fake.close();
  process.exit(0);
};
process.once('SIGINT', () => void stop('SIGINT'));
process.once('SIGTERM', () => void stop('SIGTERM'));

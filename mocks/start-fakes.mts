// Starts every local fake the demo needs and keeps them up until SIGTERM or SIGINT:
// `npx tsx mocks/start-fakes.mts`. Configuration comes from the same variables as each fake's own CLI.
import { startSmtpFake } from './smtp/server';
import { smtpFakeOptionsFromEnv } from './smtp/env-options';
import { startStripeFake } from './stripe/server';
import { stripeFakeOptionsFromEnv } from './stripe/env-options';

const stripeOptions = stripeFakeOptionsFromEnv(process.env);
const stripe = await startStripeFake(stripeOptions);
const smtp = await startSmtpFake(smtpFakeOptionsFromEnv(process.env)).catch(async (error: unknown) => {
  await stripe.close();
  throw error;
});

console.log(`stripe fake: API ${stripe.url}, pages ${stripe.publicBaseUrl}, webhooks -> ${stripeOptions.webhookUrl}`);
console.log(`smtp fake:   SMTP 127.0.0.1:${smtp.smtpPort}, inbox ${smtp.httpUrl}`);

let stopping = false;
const stop = async (signal: string) => {
  if (stopping) return;
  stopping = true;
  console.log(`fakes: ${signal}, stopping`);
  await Promise.allSettled([stripe.close(), smtp.close()]);
  process.exit(0);
};
process.once('SIGINT', () => void stop('SIGINT'));
process.once('SIGTERM', () => void stop('SIGTERM'));

// Runs the local Stripe fake on its own: `npx tsx mocks/stripe/main.mts`.
import { stripeFakeOptionsFromEnv } from './env-options';
import { startStripeFake } from './server';

const options = stripeFakeOptionsFromEnv(process.env);
const fake = await startStripeFake(options);
console.log(
  `stripe fake: API ${fake.url}, pages ${fake.publicBaseUrl}, webhooks -> ${options.webhookUrl}${options.statePath ? `, state ${options.statePath}` : ''}`,
);

const stop = async (signal: string) => {
  console.log(`stripe fake: ${signal}, stopping`);
  await fake.close();
  process.exit(0);
};
process.once('SIGINT', () => void stop('SIGINT'));
process.once('SIGTERM', () => void stop('SIGTERM'));

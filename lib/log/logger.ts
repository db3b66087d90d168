import pino from 'pino';
import { env } from '@/lib/env';

/** The one logger. JSON lines on stdout; request handlers add a request id with `logger.child`. */
export const logger = pino({
  level: env.NODE_ENV === 'test' && env.LOG_LEVEL === 'info' ? 'warn' : env.LOG_LEVEL,
  base: { app: 'dutywise' },
  redact: { paths: ['password', '*.password', 'headers.cookie', 'headers.authorization'], remove: true },
});

import { createHash } from 'node:crypto';

/** Lower-case hex SHA-256, the form stored beside every issued revision. */
export function sha256Hex(bytes: Uint8Array): string {
  return createHash('sha256').update(bytes).digest('hex');
}

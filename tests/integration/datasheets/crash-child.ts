// Child process for the crash test: issues a datasheet and, once every write is done but before the
// commit, reports the blob key and waits to be killed (SIGKILL from the test, as a crashed app would die).
import { createPostgresBlobStore, createS3BlobStore } from '@/lib/blob';
import type { CurrentUser } from '@/lib/auth/current-user';
import { issueDatasheet } from '@/lib/datasheets/issue';

const [userJson, sizingId, storeKind, endpoint] = process.argv.slice(2);
const user = JSON.parse(userJson ?? '{}') as CurrentUser;
const store =
  storeKind === 's3'
    ? createS3BlobStore({
        bucket: 'dutywise-crash',
        region: 'us-east-1',
        endpoint,
        accessKeyId: 'AKCRASHTEST',
        secretAccessKey: 'crash-secret',
      })
    : createPostgresBlobStore();
// Never outlive a test that died itself.
setTimeout(() => process.exit(3), 60_000).unref();

issueDatasheet(
  user,
  { sizingId: sizingId ?? '' },
  {
    store,
    beforeCommit: async (_tx, written) => {
      process.stdout.write(`READY ${written.blobKey}\n`);
      await new Promise(() => setInterval(() => undefined, 1000));
    },
  },
).catch((err: unknown) => {
  console.error('child issue failed', err);
  process.exit(2);
});

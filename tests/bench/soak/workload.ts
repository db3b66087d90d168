// What each person does and how often: the mix of a busy office hour. Every action resolves when it got
// the answer it should, and throws (counted as an error) when it did not.
import { parseBatchCsv } from '@/lib/batch/parse';
import { batchSheet } from '../batch-sheet';
import type { Office, Person } from './office';
import { callAction } from './server-actions';

export type Actor = { name: string; everyS: number; run: () => Promise<void> };

const heater = (flowKgPerH: number) => ({
  service: 'heater',
  gas: { preset: 'air' },
  flow: { value: flowKgPerH, unit: 'kg/h' },
  inlet: { temperature: { value: 15, unit: 'degC' }, pressure: { value: 3, unit: 'barg' } },
  outletTemperature: { value: 320, unit: 'degC' },
  heatLossPercent: 5,
  designMarginPercent: 10,
});

async function expectOk(res: Response, what: string): Promise<void> {
  const body = await res.arrayBuffer();
  if (!res.ok) throw new Error(`${what}: HTTP ${res.status} ${Buffer.from(body).toString('utf8').slice(0, 160)}`);
}

function get(office: Office, path: string, p: Person) {
  return fetch(`${office.base}${path}`, { headers: { cookie: p.cookie }, signal: AbortSignal.timeout(30_000) });
}

/** The actors: per person and action, how many seconds apart and what to do. */
export function officeActors(office: Office): Actor[] {
  const saved = new Map<string, string[]>(office.desk.map((p) => [p.email, []]));
  let counter = 0;
  const latest = (p: Person) => saved.get(p.email)!.at(-1);
  const actors: Actor[] = [];

  for (const p of office.desk) {
    // Typing at the desk: a live result about once a second while a duty point is being worked out.
    actors.push({
      name: 'desk calculation',
      everyS: 1,
      run: async () => {
        const res = await fetch(`${office.base}/api/v1/calculate`, {
          method: 'POST',
          headers: { 'content-type': 'application/json', cookie: p.cookie },
          body: JSON.stringify(heater(500 + Math.round(Math.random() * 4000))),
          signal: AbortSignal.timeout(30_000),
        });
        await expectOk(res, 'calculate');
      },
    });
    actors.push({
      name: 'save sizing',
      everyS: 30,
      run: async () => {
        const n = ++counter;
        const out = await callAction(
          office.base,
          office.actions.save,
          { accountId: p.accountId, title: `Soak heater ${n}`, equipmentTag: `SK-${n}`, input: heater(1000 + n) },
          p.cookie,
        );
        if (!out.ok) throw new Error(`save: ${out.status} ${out.error}`);
        saved.get(p.email)!.push((out.data as { id: string }).id);
      },
    });
    actors.push({
      name: 'page view',
      everyS: 20,
      run: async () => {
        const paths = ['/sizings', '/datasheets', '/size', p.quoteId ? `/quotes/${p.quoteId}` : '/quotes'];
        await expectOk(await get(office, paths[Math.floor(Math.random() * paths.length)]!, p), 'page');
      },
    });
  }

  for (const e of office.engineers) {
    actors.push({
      name: 'quote edit',
      everyS: 30,
      run: async () => {
        const sizingId = latest(e);
        if (!sizingId) return;
        const ref = { ...office.actions.addLine, pagePath: `/quotes/${e.quoteId}` };
        const out = await callAction(office.base, ref, { quoteId: e.quoteId, sizingId, quantity: 2 }, e.cookie);
        if (!out.ok) throw new Error(`quote edit: ${out.status} ${out.error}`);
      },
    });
    actors.push({
      name: 'datasheet issue',
      everyS: 60,
      run: async () => {
        const sizingId = latest(e);
        if (!sizingId) return;
        const out = await callAction(office.base, office.actions.issue, { sizingId, note: 'soak' }, e.cookie);
        if (!out.ok) throw new Error(`issue: ${out.status} ${out.error}`);
      },
    });
  }

  actors.push({
    name: 'support search',
    everyS: 6,
    run: async () => {
      const q = office.searches[Math.floor(Math.random() * office.searches.length)]!;
      await expectOk(await get(office, `/api/v1/support/search?q=${encodeURIComponent(q)}`, office.support), 'search');
    },
  });

  const uploader = office.engineers[1] ?? office.engineers[0]!;
  actors.push({
    name: 'batch upload (20 rows)',
    everyS: 120,
    run: async () => {
      const csv = batchSheet(20, 90_000 + ++counter * 20);
      const form = () => {
        const f = new FormData();
        f.set('file', new File([csv], 'enquiry.csv', { type: 'text/csv' }));
        return f;
      };
      // Streamed as Node's fetch sends a FormData (no length), as scripts upload.
      const post = async (path: string, body: FormData) =>
        fetch(`${office.base}${path}`, {
          method: 'POST',
          headers: { cookie: uploader.cookie },
          body,
          signal: AbortSignal.timeout(60_000),
        });
      await expectOk(await post('/api/v1/batch/preview', form()), 'batch preview');
      const commit = form();
      commit.set('target', JSON.stringify({ accountId: uploader.accountId }));
      // The save sends the rows that passed the check, as the desk does.
      commit.set('rows', JSON.stringify(parseBatchCsv(csv).rows));
      await expectOk(await post('/api/v1/batch/commit', commit), 'batch commit');
    },
  });
  return actors;
}

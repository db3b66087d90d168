// The office the soak plays: who signs in, which accounts and quote each person works on, and the ids of
// the server actions in the build. Read once before the clock starts.
import type { Client } from 'pg';
import { callAction, findAction, type ActionRef } from './server-actions';

export type Person = { email: string; cookie: string; accountId: string; quoteId: string | null };
export type Office = {
  base: string;
  engineers: Person[];
  /** Everyone who sizes at the desk: the engineers, the admin and a customer. */
  desk: Person[];
  support: Person;
  searches: string[];
  actions: { save: ActionRef; issue: ActionRef; addLine: ActionRef };
};

const password = 'dutywise-demo';

async function signIn(base: string, email: string): Promise<string> {
  const res = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  const cookie = res.headers.get('set-cookie')?.split(';')[0];
  if (!res.ok || !cookie) throw new Error(`${email} could not sign in (HTTP ${res.status}); is the demo seeded?`);
  return cookie;
}

async function accountId(client: Client, name: string): Promise<string> {
  const { rows } = await client.query<{ id: string }>('select id from accounts where name = $1', [name]);
  if (!rows[0]) throw new Error(`no account named ${name}; is the demo seeded?`);
  return rows[0].id;
}

/** Signs the office in, gives each engineer a fresh draft quote, and picks what support looks up. */
export async function openOffice(base: string, distDir: string, client: Client): Promise<Office> {
  const tarnside = await accountId(client, 'Tarnside Polymers');
  const greyfen = await accountId(client, 'Greyfen Biogas');
  const oakhollow = await accountId(client, 'Oakhollow Glassworks');
  const person = async (email: string, account: string): Promise<Person> => ({
    email,
    cookie: await signIn(base, email),
    accountId: account,
    quoteId: null,
  });
  const engineers = [
    await person('ines.marlow@halvard.example', greyfen),
    await person('tobias.rennick@halvard.example', oakhollow),
  ];
  const createQuote = findAction(distDir, 'app/(desk)/quotes/new/actions.ts', 'createQuoteAction');
  for (const e of engineers) {
    const made = await callAction(base, createQuote, { accountId: e.accountId, title: 'Soak run quote' }, e.cookie);
    if (!made.ok) throw new Error(`could not create a draft quote: ${made.error}`);
    e.quoteId = (made.data as { id: string }).id;
  }
  // The customer saves sizings, which a subscriber may: the soak's copy of the demo gives its account one.
  await client.query(
    `insert into subscriptions (account_id, stripe_subscription_id, status, current_period_end)
     values ($1, $2, 'active', now() + interval '30 days') on conflict (stripe_subscription_id) do nothing`,
    [tarnside, `sub_soak_${tarnside}`],
  );
  const desk = [
    ...engineers,
    await person('admin@halvard.example', tarnside),
    await person('olu.bennet@tarnside.example', tarnside),
  ];
  const { rows } = await client.query<{ number: string; tag: string; name: string }>(
    `select s.number, s.equipment_tag as tag, a.name from sizings s join accounts a on a.id = s.account_id
     where s.equipment_tag is not null order by s.created_at desc limit 1`,
  );
  const seen = rows[0];
  return {
    base,
    engineers,
    desk,
    support: await person('priya.caldwell@halvard.example', tarnside),
    searches: seen ? [seen.tag, seen.name, seen.number, seen.tag.slice(0, 3)] : ['EH-301', 'Tarnside', 'EH'],
    actions: {
      save: findAction(distDir, 'app/(desk)/size/actions.ts', 'saveSizingAction'),
      issue: findAction(distDir, 'app/(desk)/datasheets/actions.ts', 'issueDatasheetAction'),
      addLine: findAction(distDir, 'app/(desk)/quotes/[quoteId]/actions.ts', 'addQuoteLineAction', {
        quoteId: engineers[0]!.quoteId!,
      }),
    },
  };
}

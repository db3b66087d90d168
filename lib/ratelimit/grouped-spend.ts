import 'server-only';
import type { Pool } from 'pg';
import { groupWhileBusy } from '@/db/grouped';

// Spends rate-limit points in shared round trips (db/grouped.ts): the spends that arrive while an upsert is on
// its way go out together in the next one, one row per key. The counters are the same rows of the same table
// that rate-limiter-flexible's PostgreSQL store keeps (key, points, expire in epoch ms; a window starts at the
// first point spent and resets once expired), so every instance of the app shares them and sees the others'
// counts.

export type Spent = {
  /** The key's points in its window once this spend is counted (earlier spends in the same batch included). */
  consumed: number;
  /** When the window ends, in epoch ms. */
  expire: number;
};

type Spend = { key: string; points: number; durationMs: number };

/** A spender over `table` on `pool`: `spend(key, points, durationMs)` adds to the key's counter. */
export function groupedSpender(pool: Pool, table: string) {
  const text = `insert into ${table} (key, points, expire)
      select * from unnest($1::varchar[], $2::int[], $3::bigint[])
    on conflict (key) do update set
      points = case when ${table}.expire <= $4 then excluded.points else ${table}.points + excluded.points end,
      expire = case when ${table}.expire <= $4 then excluded.expire else ${table}.expire end
    returning key, points, expire`;

  const run = async (spends: Spend[]): Promise<Spent[]> => {
    const now = Date.now();
    // One row per key (an upsert may not touch a row twice): the points of its spends added up.
    const perKey = new Map<string, { points: number; expire: number }>();
    for (const s of spends) {
      const k = perKey.get(s.key) ?? { points: 0, expire: now + s.durationMs };
      k.points += s.points;
      perKey.set(s.key, k);
    }
    const keys = [...perKey.keys()];
    const res = await pool.query<{ key: string; points: number; expire: string }>({
      name: `grouped-spend-${table}`,
      text,
      values: [keys, keys.map((k) => perKey.get(k)!.points), keys.map((k) => perKey.get(k)!.expire), now],
    });
    // Each key's new total less what this batch added is where its spends start counting from, in call order.
    const running = new Map(
      res.rows.map((r) => [r.key, { at: r.points - perKey.get(r.key)!.points, expire: r.expire }]),
    );
    return spends.map((s) => {
      const r = running.get(s.key);
      if (!r) throw new Error('rate-limit counter missing from the upsert');
      r.at += s.points;
      return { consumed: r.at, expire: Number(r.expire) };
    });
  };

  const spendOne = groupWhileBusy(run);
  return (key: string, points: number, durationMs: number) => spendOne({ key, points, durationMs });
}

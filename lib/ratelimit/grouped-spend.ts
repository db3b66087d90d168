import 'server-only';
import type { Pool } from 'pg';

// Spends rate-limit points in shared round trips ("group commit"). The first spend goes out at once; while a
// statement is on its way, every further spend (of any key) waits for it and then goes out with the others in
// one upsert. A lone request pays what a single upsert costs; fifty at once pay for about two statements,
// not fifty. The counters are the same rows of the same table that rate-limiter-flexible's PostgreSQL store
// keeps (key, points, expire in epoch ms; a window starts at the first point spent and resets once expired),
// so every instance of the app shares them and sees the others' counts.

export type Spent = {
  /** The key's points in its window once this spend is counted (earlier spends in the same batch included). */
  consumed: number;
  /** When the window ends, in epoch ms. */
  expire: number;
};

type Waiter = { points: number; resolve: (s: Spent) => void; reject: (e: unknown) => void };
type Pending = { durationMs: number; waiters: Waiter[] };

export class GroupedSpender {
  private pending = new Map<string, Pending>();
  private inFlight = false;

  constructor(
    private readonly pool: Pool,
    private readonly table: string,
  ) {}

  /** Adds `points` to `key`'s counter (a new window of `durationMs` when none is open). */
  spend(key: string, points: number, durationMs: number): Promise<Spent> {
    return new Promise<Spent>((resolve, reject) => {
      const entry = this.pending.get(key) ?? { durationMs, waiters: [] };
      entry.waiters.push({ points, resolve, reject });
      this.pending.set(key, entry);
      if (!this.inFlight) this.flush();
    });
  }

  private flush(): void {
    if (!this.pending.size) return;
    const batch = this.pending;
    this.pending = new Map();
    this.inFlight = true;
    const keys = [...batch.keys()];
    const now = Date.now();
    const sums = keys.map((k) => batch.get(k)!.waiters.reduce((n, w) => n + w.points, 0));
    const expires = keys.map((k) => now + batch.get(k)!.durationMs);
    const t = this.table;
    this.pool
      .query<{ key: string; points: number; expire: string }>({
        name: `grouped-spend-${t}`,
        text: `insert into ${t} (key, points, expire)
            select * from unnest($1::varchar[], $2::int[], $3::bigint[])
          on conflict (key) do update set
            points = case when ${t}.expire <= $4 then excluded.points else ${t}.points + excluded.points end,
            expire = case when ${t}.expire <= $4 then excluded.expire else ${t}.expire end
          returning key, points, expire`,
        values: [keys, sums, expires, now],
      })
      .then(
        (res) => {
          for (const row of res.rows) {
            const { waiters } = batch.get(row.key)!;
            // The batch's points were added together; hand them out in the order they were asked for.
            let consumed = row.points - waiters.reduce((n, w) => n + w.points, 0);
            for (const w of waiters) {
              consumed += w.points;
              w.resolve({ consumed, expire: Number(row.expire) });
            }
            batch.delete(row.key);
          }
          for (const { waiters } of batch.values())
            for (const w of waiters) w.reject(new Error('rate-limit counter missing from the upsert'));
        },
        (err) => {
          for (const { waiters } of batch.values()) for (const w of waiters) w.reject(err);
        },
      )
      .finally(() => {
        this.inFlight = false;
        this.flush();
      });
  }
}

/**
 * Turns a statement that serves many callers at once (`run`, one answer per input, in order) into a function
 * of one input whose calls share round trips: the first call goes out at once; calls made while a round trip
 * is on its way wait for it and then go out together in the next. A lone request pays what it paid before;
 * under load, fifty requests cost a few statements instead of fifty. Each round trip to PostgreSQL costs the
 * app more CPU than most of its short statements cost the database, so this is where load is won.
 *
 * Unlike a per-tick batcher (DataLoader's default), calls are gathered for as long as the database is busy,
 * which is when gathering pays. A round trip that fails with more than one input is retried input by input,
 * so one caller's bad input never fails its neighbours.
 */
export function groupWhileBusy<I, O>(run: (inputs: I[]) => Promise<O[]>): (input: I) => Promise<O> {
  type Call = { input: I; resolve: (o: O) => void; reject: (e: unknown) => void };
  let waiting: Call[] = [];
  let busy = false;

  const settle = async (calls: Call[]) => {
    try {
      const out = await run(calls.map((c) => c.input));
      calls.forEach((c, i) => c.resolve(out[i]!));
    } catch (err) {
      if (calls.length === 1) calls[0]!.reject(err);
      else for (const c of calls) await settle([c]);
    }
  };

  const flush = () => {
    if (busy || !waiting.length) return;
    const calls = waiting;
    waiting = [];
    busy = true;
    void settle(calls).finally(() => {
      busy = false;
      flush();
    });
  };

  return (input: I) =>
    new Promise<O>((resolve, reject) => {
      waiting.push({ input, resolve, reject });
      flush();
    });
}

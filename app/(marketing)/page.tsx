import Link from 'next/link';

const strengths = [
  {
    title: 'Heater duty in kW',
    body: 'Absorbed duty from the enthalpy integral of temperature-dependent cp, with the mean-cp estimate beside it, losses, margin, the next catalogue rating and the supply current.',
  },
  {
    title: 'Compressor power by stage',
    body: 'Constant-k and variable-cp methods side by side, one to six stages with intercooling, discharge temperatures against your limit, shaft power and motor rating.',
  },
  {
    title: 'Units people actually send',
    body: 'kg/h, Nm³/h, Sm³/h, SCFM, MMSCFD, gauge or absolute pressure against the site barometer: each flow basis is named and printed on the datasheet.',
  },
  {
    title: 'A record of what was quoted',
    body: 'Every sizing is saved to a customer account, grouped into quotes and issued as revisioned PDF datasheets that never change once issued.',
  },
];

export default function LandingPage() {
  return (
    <div>
      <section className="bg-ink text-paper">
        <div className="mx-auto grid max-w-6xl gap-10 px-6 py-16 md:grid-cols-[1.3fr_1fr]">
          <div>
            <p className="text-label uppercase tracking-widest text-copper-100">
              Sizing desk for gas heaters and compressors
            </p>
            <h1 className="mt-3 text-4xl font-semibold leading-tight md:text-5xl">
              From enquiry to defensible duty in under a minute.
            </h1>
            <p className="mt-5 max-w-xl text-lg text-paper-sunk">
              Dutywise turns a flow, an inlet state and a target into heater kilowatts or compressor shaft power from
              ideal-gas property data, keeps every sizing on the customer&apos;s account and issues the datasheet.
            </p>
            <div className="mt-8 flex flex-wrap gap-3">
              <Link
                href="/size"
                className="rounded-md bg-copper-500 px-5 py-2.5 font-medium text-white hover:bg-copper-600"
              >
                Size a duty now
              </Link>
              <Link
                href="/sign-in"
                className="rounded-md border border-paper-sunk/40 px-5 py-2.5 font-medium hover:bg-ink-soft"
              >
                Sign in to your desk
              </Link>
            </div>
          </div>
          <dl className="grid grid-cols-2 gap-px self-center overflow-hidden rounded-panel bg-ink-soft text-sm">
            {[
              ['Air, 2 t/h at 3 barg', '15 → 320 °C'],
              ['Answer', 'kW, amps, rating'],
              ['N₂, 1 500 Nm³/h', '1 → 30 bar(a)'],
              ['Answer', 'stages, °C, motor'],
            ].map(([k, v]) => (
              <div key={k} className="bg-ink p-4">
                <dt className="text-paper-line">{k}</dt>
                <dd className="mt-1 font-mono text-lg text-paper">{v}</dd>
              </div>
            ))}
          </dl>
        </div>
      </section>
      <section className="mx-auto grid max-w-6xl gap-6 px-6 py-14 md:grid-cols-2">
        {strengths.map((s) => (
          <article
            key={s.title}
            className="rounded-panel border border-paper-line bg-paper-raised p-panel shadow-panel"
          >
            <h2 className="text-lg font-semibold">{s.title}</h2>
            <p className="mt-2 text-ink-soft">{s.body}</p>
          </article>
        ))}
      </section>
      <section className="mx-auto max-w-6xl px-6 pb-16">
        <div className="rounded-panel border-l-4 border-severity-warning bg-copper-50 p-panel text-sm text-ink-soft">
          <strong className="text-ink">Preliminary sizing only.</strong> Heaters present hot surfaces and large
          electrical loads; compressors contain pressure and raise gas temperature. Flammable and oxidising gases need
          hazardous-area and oxygen-service practice. Dutywise results support a quote; they do not replace design by a
          licensed engineer under local codes.
        </div>
      </section>
    </div>
  );
}

// The SQL that fills one range of generated sizings, their datasheets and quotes, entirely inside the
// database: generate_series numbers the rows, hashint4 makes every pick deterministic, and each row copies
// one of the engine templates loaded into bench_templates. Nothing crosses the wire per row.

/** A deterministic pick in [0, n): the hash of the row number salted per column. */
const h = (salt: number, n: string | number) => `((hashint4(g * 16 + ${salt}) & 2147483647) % ${n})`;

/** Unique, stable ids, so datasheets and quotes can name their sizing without looking it up. */
export const sizingId = (g: string) => `md5('bench-sizing-' || ${g})::uuid`;

/**
 * Parameters: $1 first row number, $2 last, $3 account ids, $4 creator ids, $5 areas, $6 purposes,
 * $7 note sentences, $8 tag prefixes, $9 the number of rows the database will hold. Rows spread evenly over
 * the five years before now() in the order they are written, as saved sizings are (so the table's physical
 * order follows created_at), give or take an hour, microseconds included so sort keys rarely tie.
 */
export const insertSizings = `
  insert into sizings (id, number, account_id, title, equipment_tag, notes, service, gas_key, gas_label, input,
    result, engine_version, headline_kw, mass_flow_kg_per_s, created_by_user_id, created_at, updated_at)
  select ${sizingId('g')},
    'S' || to_char(c.at, 'YY') || '-' || lpad(g::text, 7, '0'),
    ($3::uuid[])[1 + ${h(1, 'cardinality($3::uuid[])')}],
    initcap(($5::text[])[1 + ${h(2, 'cardinality($5::text[])')}]) || ' ' || (1 + ${h(3, 9)}) || ' '
      || ($6::text[])[1 + ${h(4, 'cardinality($6::text[])')}] || ' ' || t.service,
    ($8::text[])[1 + ${h(5, 'cardinality($8::text[])')}] || '-' || (100 + ${h(6, 9900)})
      || case when ${h(7, 2)} = 0 then chr(65 + ${h(8, 26)}) else '' end,
    case when ${h(9, 2)} = 0 then ($7::text[])[1 + ${h(10, 'cardinality($7::text[])')}]
      || case when ${h(11, 3)} = 0 then ' ' || ($7::text[])[1 + ${h(12, 'cardinality($7::text[])')}] else '' end end,
    t.service::service, t.gas, replace(t.gas, '-', ' '), t.input, t.result, 'bench', t.headline_kw,
    t.mass_flow_kg_per_s, ($4::uuid[])[1 + ${h(13, 'cardinality($4::uuid[])')}], c.at, c.at
  from generate_series($1::int, $2::int) g
  cross join lateral (select now() - make_interval(secs => 157680000 * (1 - g::float8 / $9) + ${h(14, 3600)}
    + ${h(15, 1_000_000)} / 1e6) as at) c
  join bench_templates t on t.k = ${h(0, '(select count(*) from bench_templates)')}`;

/** One datasheet for every twentieth sizing or so ($1..$2 as above). */
export const insertDatasheets = `
  insert into datasheets (id, number, account_id, sizing_id, created_at)
  select md5('bench-datasheet-' || g)::uuid, 'DS' || to_char(s.created_at, 'YY') || '-' || lpad(g::text, 7, '0'),
    s.account_id, s.id, s.created_at
  from generate_series($1::int, $2::int) g
  join sizings s on s.id = ${sizingId('g')}
  where ${h(20, 20)} = 0`;

/** One quote, with this sizing as its only line, for every fortieth sizing or so ($1..$2, $3 creators). */
export const insertQuotes = `
  with picked as (
    select g, s.id, s.account_id, s.created_at, s.title
    from generate_series($1::int, $2::int) g
    join sizings s on s.id = ${sizingId('g')}
    where ${h(21, 40)} = 0
  ), q as (
    insert into quotes (id, number, account_id, title, status, created_by_user_id, created_at, updated_at)
    select md5('bench-quote-' || g)::uuid, 'Q' || to_char(created_at, 'YY') || '-' || lpad(g::text, 7, '0'),
      account_id, split_part(title, ' ', 1) || ' ' || split_part(title, ' ', 2) || ' package',
      (array['draft', 'sent', 'won', 'lost'])[1 + ${h(22, 4)}]::quote_status,
      ($3::uuid[])[1 + ${h(23, 'cardinality($3::uuid[])')}], created_at, created_at
    from picked
  )
  insert into quote_items (quote_id, sizing_id, quantity, position, created_at)
  select md5('bench-quote-' || g)::uuid, id, 1, 0, created_at from picked`;

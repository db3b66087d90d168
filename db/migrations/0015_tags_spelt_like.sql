-- The tags in use spelt most like a text, at a trigram similarity of at least 0.5: the look-up's first try at
-- close spellings of a tag. The SET clause holds pg_trgm's floor for `%` at 0.5 while the function runs (and
-- restores the connection's own afterwards), so the trigram index serves the strict floor in one statement;
-- filtering the connection's looser matches afterwards would recheck ten times as many rows.
CREATE OR REPLACE FUNCTION dutywise_tags_spelt_like(t text, n integer) RETURNS SETOF text
  LANGUAGE sql STABLE
  SET pg_trgm.similarity_threshold = 0.5
  AS $$ SELECT tag FROM search_tags WHERE tag % t ORDER BY similarity(tag, t) DESC, tag LIMIT n $$;

-- The look-up's word and tag lists (search_words, search_tags) follow the sizings that use them. One
-- statement-level trigger per event adds whatever a statement's rows bring; rows are inserted in sorted
-- order so two saves adding the same new words wait for each other instead of deadlocking.
CREATE OR REPLACE FUNCTION dutywise_collect_search_terms() RETURNS trigger AS $$
BEGIN
  INSERT INTO search_words (word)
    SELECT w FROM new_rows r,
      unnest(tsvector_to_array(to_tsvector('simple', coalesce(r.title, '') || ' ' || coalesce(r.notes, '')))) w
    WHERE w ~ '^[[:alpha:]]{3,}$'
    GROUP BY w ORDER BY w
  ON CONFLICT DO NOTHING;
  INSERT INTO search_tags (tag)
    SELECT lower(r.equipment_tag) FROM new_rows r WHERE r.equipment_tag IS NOT NULL
    GROUP BY 1 ORDER BY 1
  ON CONFLICT DO NOTHING;
  RETURN NULL;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER sizings_search_terms_insert AFTER INSERT ON sizings
  REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION dutywise_collect_search_terms();
--> statement-breakpoint
CREATE TRIGGER sizings_search_terms_update AFTER UPDATE ON sizings
  REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION dutywise_collect_search_terms();
--> statement-breakpoint
-- Fills both lists from every sizing: after this migration, and after a bulk load that bypassed triggers.
CREATE OR REPLACE FUNCTION refresh_search_terms() RETURNS void AS $$
  INSERT INTO search_words (word)
    SELECT DISTINCT w FROM sizings r,
      unnest(tsvector_to_array(to_tsvector('simple', coalesce(r.title, '') || ' ' || coalesce(r.notes, '')))) w
    WHERE w ~ '^[[:alpha:]]{3,}$'
  ON CONFLICT DO NOTHING;
  INSERT INTO search_tags (tag)
    SELECT DISTINCT lower(equipment_tag) FROM sizings WHERE equipment_tag IS NOT NULL
  ON CONFLICT DO NOTHING;
$$ LANGUAGE sql;
--> statement-breakpoint
SELECT refresh_search_terms();
--> statement-breakpoint
-- The new text column and lists need statistics before the planner can choose between their indexes.
ANALYZE sizings, search_words, search_tags;

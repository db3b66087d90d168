-- Issued datasheet revisions are documents of record: the database itself refuses to change them.
CREATE OR REPLACE FUNCTION dutywise_refuse_change() RETURNS trigger AS $$
BEGIN
  RAISE EXCEPTION 'issued datasheet revisions are immutable (% on %)', TG_OP, TG_TABLE_NAME
    USING ERRCODE = 'restrict_violation';
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER datasheet_revisions_immutable BEFORE UPDATE OR DELETE ON datasheet_revisions
  FOR EACH ROW EXECUTE FUNCTION dutywise_refuse_change();
--> statement-breakpoint
CREATE SEQUENCE IF NOT EXISTS quote_number_seq START 101;
--> statement-breakpoint
CREATE SEQUENCE IF NOT EXISTS sizing_number_seq START 1001;
--> statement-breakpoint
CREATE SEQUENCE IF NOT EXISTS datasheet_number_seq START 501;

-- A quote document, once bound, is a document of record like an issued datasheet revision: the database itself
-- refuses to change or remove it (even for the schema's owner). A changed quote gets a new edition instead.
CREATE OR REPLACE FUNCTION dutywise_refuse_document_change() RETURNS trigger AS $$
BEGIN
  RAISE EXCEPTION 'stored quote documents are immutable (% on %)', TG_OP, TG_TABLE_NAME
    USING ERRCODE = 'restrict_violation';
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER quote_documents_immutable BEFORE UPDATE OR DELETE ON quote_documents
  FOR EACH ROW EXECUTE FUNCTION dutywise_refuse_document_change();
--> statement-breakpoint
-- As with issued revisions: besides the trigger, the app is never granted changing them.
REVOKE UPDATE, DELETE ON quote_documents FROM dutywise_app;

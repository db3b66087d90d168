-- Nothing wrote quote_documents before this migration (the table stood empty), so its new NOT NULL columns need no default.
ALTER TABLE "quote_documents" ADD COLUMN "edition" integer NOT NULL;--> statement-breakpoint
ALTER TABLE "quote_documents" ADD COLUMN "content_key" text NOT NULL;--> statement-breakpoint
ALTER TABLE "quote_documents" ADD COLUMN "lines" jsonb NOT NULL;--> statement-breakpoint
ALTER TABLE "quote_documents" ADD COLUMN "page_count" integer NOT NULL;--> statement-breakpoint
CREATE UNIQUE INDEX "quote_documents_edition_uq" ON "quote_documents" USING btree ("quote_id","edition");--> statement-breakpoint
ALTER TABLE "quote_documents" ADD CONSTRAINT "quote_documents_edition_positive" CHECK ("quote_documents"."edition" >= 1);--> statement-breakpoint
ALTER TABLE "quote_documents" ADD CONSTRAINT "quote_documents_sha256" CHECK ("quote_documents"."sha256" ~ '^[0-9a-f]{64}$');--> statement-breakpoint
ALTER TABLE "quote_documents" ADD CONSTRAINT "quote_documents_blob_namespaced" CHECK ("quote_documents"."blob_key" like 'accounts/' || "quote_documents"."account_id"::text || '/%');
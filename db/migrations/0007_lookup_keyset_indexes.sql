CREATE TABLE "search_tags" (
	"tag" text PRIMARY KEY NOT NULL
);
--> statement-breakpoint
CREATE TABLE "search_words" (
	"word" text PRIMARY KEY NOT NULL
);
--> statement-breakpoint
DROP INDEX "sizings_account_created_idx";--> statement-breakpoint
DROP INDEX "sizings_created_idx";--> statement-breakpoint
DROP INDEX "sizings_tag_lower_idx";--> statement-breakpoint
DROP INDEX "sizings_search_trgm_idx";--> statement-breakpoint
DROP INDEX "sizings_title_trgm_idx";--> statement-breakpoint
CREATE INDEX "search_tags_trgm_idx" ON "search_tags" USING gin ("tag" gin_trgm_ops);--> statement-breakpoint
CREATE INDEX "search_words_trgm_idx" ON "search_words" USING gin ("word" gin_trgm_ops);--> statement-breakpoint
CREATE INDEX "sizings_created_id_idx" ON "sizings" USING btree ("created_at","id");--> statement-breakpoint
CREATE INDEX "sizings_headline_id_idx" ON "sizings" USING btree ("headline_kw","id");--> statement-breakpoint
CREATE INDEX "sizings_account_created_id_idx" ON "sizings" USING btree ("account_id","created_at","id");--> statement-breakpoint
CREATE INDEX "sizings_number_pattern_idx" ON "sizings" USING btree ("number" text_pattern_ops);--> statement-breakpoint
CREATE INDEX "sizings_tag_pattern_idx" ON "sizings" USING btree (lower("equipment_tag") text_pattern_ops);--> statement-breakpoint
CREATE INDEX "quotes_number_pattern_idx" ON "quotes" USING btree ("number" text_pattern_ops);--> statement-breakpoint
CREATE INDEX "datasheets_number_pattern_idx" ON "datasheets" USING btree ("number" text_pattern_ops);--> statement-breakpoint
ALTER TABLE "sizings" DROP COLUMN "search_text";
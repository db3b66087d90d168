CREATE TABLE "sizing_versions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"sizing_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"title" text NOT NULL,
	"equipment_tag" text,
	"notes" text,
	"gas_label" text NOT NULL,
	"input" json NOT NULL,
	"result" jsonb NOT NULL,
	"engine_version" text NOT NULL,
	"headline_kw" double precision NOT NULL,
	"mass_flow_kg_per_s" double precision NOT NULL,
	"created_by_user_id" uuid,
	"saved_at" timestamp with time zone NOT NULL,
	"superseded_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "sizing_versions_version_positive" CHECK ("sizing_versions"."version" >= 1)
);
--> statement-breakpoint
CREATE TABLE "quote_documents" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"quote_id" uuid NOT NULL,
	"account_id" uuid NOT NULL,
	"blob_key" text NOT NULL,
	"sha256" text NOT NULL,
	"byte_size" integer NOT NULL,
	"made_by_user_id" uuid,
	"made_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "sizings" DROP CONSTRAINT "sizings_revised_from_id_sizings_id_fk";
--> statement-breakpoint
ALTER TABLE "sizings" ALTER COLUMN "input" SET DATA TYPE json;--> statement-breakpoint
ALTER TABLE "accounts" ADD COLUMN "unit_system" "unit_system" DEFAULT 'si' NOT NULL;--> statement-breakpoint
ALTER TABLE "accounts" ADD COLUMN "currency" text DEFAULT 'USD' NOT NULL;--> statement-breakpoint
ALTER TABLE "sizings" ADD COLUMN "updated_by_user_id" uuid;--> statement-breakpoint
ALTER TABLE "quote_items" ADD COLUMN "unit_price" numeric(14, 2);--> statement-breakpoint
ALTER TABLE "sizing_versions" ADD CONSTRAINT "sizing_versions_sizing_id_sizings_id_fk" FOREIGN KEY ("sizing_id") REFERENCES "public"."sizings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sizing_versions" ADD CONSTRAINT "sizing_versions_created_by_user_id_users_id_fk" FOREIGN KEY ("created_by_user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quote_documents" ADD CONSTRAINT "quote_documents_quote_id_quotes_id_fk" FOREIGN KEY ("quote_id") REFERENCES "public"."quotes"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quote_documents" ADD CONSTRAINT "quote_documents_account_id_accounts_id_fk" FOREIGN KEY ("account_id") REFERENCES "public"."accounts"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quote_documents" ADD CONSTRAINT "quote_documents_made_by_user_id_users_id_fk" FOREIGN KEY ("made_by_user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "sizing_versions_uq" ON "sizing_versions" USING btree ("sizing_id","version");--> statement-breakpoint
CREATE INDEX "quote_documents_quote_idx" ON "quote_documents" USING btree ("quote_id","made_at" DESC NULLS LAST);--> statement-breakpoint
CREATE UNIQUE INDEX "quote_documents_blob_uq" ON "quote_documents" USING btree ("blob_key");--> statement-breakpoint
ALTER TABLE "sizings" ADD CONSTRAINT "sizings_updated_by_user_id_users_id_fk" FOREIGN KEY ("updated_by_user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sizings" DROP COLUMN "revised_from_id";--> statement-breakpoint
ALTER TABLE "accounts" ADD CONSTRAINT "accounts_currency_code" CHECK ("accounts"."currency" ~ '^[A-Z]{3}$');--> statement-breakpoint
ALTER TABLE "quote_items" ADD CONSTRAINT "quote_items_price_range" CHECK ("quote_items"."unit_price" is null or "quote_items"."unit_price" >= 0);
ALTER TABLE "invitations" ALTER COLUMN "account_id" DROP NOT NULL;--> statement-breakpoint
ALTER TABLE "invitations" ADD COLUMN "role" "user_role" DEFAULT 'customer' NOT NULL;--> statement-breakpoint
ALTER TABLE "invitations" ADD CONSTRAINT "invitations_account_for_customers" CHECK (("invitations"."role" = 'customer') = ("invitations"."account_id" is not null));
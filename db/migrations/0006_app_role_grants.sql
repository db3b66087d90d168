-- The app signs in as dutywise_app, a role that owns nothing: it reads and writes rows, and cannot change the
-- schema, drop or disable the revision-immutability trigger, or truncate a table. Migrations run as the
-- schema's owner, whose later tables and sequences reach the app through the default privileges below.
-- A deployment may create the role itself first (with LOGIN and a password); otherwise it is created here
-- without LOGIN, which needs CREATEROLE, and the deployment adds LOGIN and a password.
DO $$
BEGIN
  IF NOT EXISTS (SELECT FROM pg_roles WHERE rolname = 'dutywise_app') THEN
    CREATE ROLE dutywise_app NOLOGIN;
  END IF;
END
$$;
--> statement-breakpoint
REVOKE CREATE ON SCHEMA public FROM PUBLIC;
--> statement-breakpoint
GRANT USAGE ON SCHEMA public TO dutywise_app;
--> statement-breakpoint
GRANT SELECT, INSERT, UPDATE, DELETE ON ALL TABLES IN SCHEMA public TO dutywise_app;
--> statement-breakpoint
GRANT USAGE, SELECT ON ALL SEQUENCES IN SCHEMA public TO dutywise_app;
--> statement-breakpoint
ALTER DEFAULT PRIVILEGES IN SCHEMA public GRANT SELECT, INSERT, UPDATE, DELETE ON TABLES TO dutywise_app;
--> statement-breakpoint
ALTER DEFAULT PRIVILEGES IN SCHEMA public GRANT USAGE, SELECT ON SEQUENCES TO dutywise_app;
--> statement-breakpoint
-- Issued revisions are documents of record: besides the trigger, the app is never granted changing them.
REVOKE UPDATE, DELETE ON datasheet_revisions FROM dutywise_app;

ALTER TABLE "photo" ADD COLUMN "version" integer DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE "reading" ADD COLUMN "version" integer DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE "visit" ADD COLUMN "version" integer DEFAULT 1 NOT NULL;
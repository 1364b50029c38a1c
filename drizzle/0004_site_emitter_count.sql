ALTER TABLE "site" ADD COLUMN "emitter_count" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
CREATE INDEX "site_org_emitters_idx" ON "site" USING btree ("organization_id","emitter_count");
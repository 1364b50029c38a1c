DROP INDEX "site_org_emitters_idx";--> statement-breakpoint
CREATE INDEX "site_org_emitters_idx" ON "site" USING btree ("organization_id","emitter_count","id");
CREATE INDEX "site_org_kind_idx" ON "site" USING btree ("organization_id","kind","id");--> statement-breakpoint
CREATE INDEX "site_org_city_idx" ON "site" USING btree ("organization_id","city","id");
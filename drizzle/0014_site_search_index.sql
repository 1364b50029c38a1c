-- pg_trgm ships with PostgreSQL (contrib) and is a trusted extension: a database owner may create it.
CREATE EXTENSION IF NOT EXISTS pg_trgm;--> statement-breakpoint
CREATE INDEX "site_search_idx" ON "site" USING gin ("name" gin_trgm_ops,"city" gin_trgm_ops,"address" gin_trgm_ops);

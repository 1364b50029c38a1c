-- The sites list searches with %text% on name, city and address; a trigram index (next migration)
-- serves that. pg_trgm ships with PostgreSQL (contrib) and is a trusted extension, so the database
-- owner may create it.
CREATE EXTENSION IF NOT EXISTS pg_trgm;

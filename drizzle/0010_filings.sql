CREATE TABLE "filing" (
	"id" text PRIMARY KEY NOT NULL,
	"organization_id" text NOT NULL,
	"site_id" text NOT NULL,
	"assessment_id" text NOT NULL,
	"document_id" text NOT NULL,
	"regulator_member_id" text,
	"authority" text NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"filed_by_user_id" text,
	"filed_by_name" text NOT NULL,
	"filed_at" timestamp with time zone DEFAULT now() NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "filing" ADD CONSTRAINT "filing_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "filing" ADD CONSTRAINT "filing_site_id_site_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."site"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "filing" ADD CONSTRAINT "filing_assessment_id_assessment_id_fk" FOREIGN KEY ("assessment_id") REFERENCES "public"."assessment"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "filing" ADD CONSTRAINT "filing_document_id_document_id_fk" FOREIGN KEY ("document_id") REFERENCES "public"."document"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "filing" ADD CONSTRAINT "filing_regulator_member_id_member_id_fk" FOREIGN KEY ("regulator_member_id") REFERENCES "public"."member"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "filing" ADD CONSTRAINT "filing_filed_by_user_id_user_id_fk" FOREIGN KEY ("filed_by_user_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "filing_org_idx" ON "filing" USING btree ("organization_id","filed_at");--> statement-breakpoint
CREATE INDEX "filing_regulator_idx" ON "filing" USING btree ("regulator_member_id","filed_at");--> statement-breakpoint
CREATE UNIQUE INDEX "filing_assessment_regulator_idx" ON "filing" USING btree ("assessment_id","regulator_member_id");
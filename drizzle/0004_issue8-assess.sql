CREATE TABLE "assessment" (
	"id" text PRIMARY KEY NOT NULL,
	"organization_id" text NOT NULL,
	"site_id" text NOT NULL,
	"name" text NOT NULL,
	"author_user_id" text,
	"author_name" text NOT NULL,
	"standard" text NOT NULL,
	"tier" text NOT NULL,
	"options" jsonb NOT NULL,
	"site" jsonb NOT NULL,
	"inventory" jsonb NOT NULL,
	"runs" json NOT NULL,
	"summary" jsonb NOT NULL,
	"results" jsonb NOT NULL,
	"engine" text NOT NULL,
	"mitigation" jsonb NOT NULL,
	"mitigation_version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "assessment" ADD CONSTRAINT "assessment_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "assessment" ADD CONSTRAINT "assessment_site_id_site_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."site"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "assessment" ADD CONSTRAINT "assessment_author_user_id_user_id_fk" FOREIGN KEY ("author_user_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "assessment_site_idx" ON "assessment" USING btree ("site_id","created_at");--> statement-breakpoint
CREATE INDEX "assessment_org_idx" ON "assessment" USING btree ("organization_id","created_at");
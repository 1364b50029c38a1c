CREATE TABLE "exposure_result" (
	"organization_id" text NOT NULL,
	"site_id" text NOT NULL,
	"key" text NOT NULL,
	"result" text NOT NULL,
	"compute_ms" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "exposure_result_site_id_key_pk" PRIMARY KEY("site_id","key")
);
--> statement-breakpoint
ALTER TABLE "exposure_result" ADD CONSTRAINT "exposure_result_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "exposure_result" ADD CONSTRAINT "exposure_result_site_id_site_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."site"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "exposure_result_site_created_idx" ON "exposure_result" USING btree ("site_id","created_at");
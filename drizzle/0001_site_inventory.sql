CREATE TABLE "stored_file" (
	"id" text PRIMARY KEY NOT NULL,
	"organization_id" text NOT NULL,
	"purpose" text NOT NULL,
	"file_name" text NOT NULL,
	"media_type" text NOT NULL,
	"byte_size" integer NOT NULL,
	"sha256" text NOT NULL,
	"bytes" "bytea" NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "client" (
	"id" text PRIMARY KEY NOT NULL,
	"organization_id" text NOT NULL,
	"name" text NOT NULL,
	"billing_address" text DEFAULT '' NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "client_contact" (
	"id" text PRIMARY KEY NOT NULL,
	"organization_id" text NOT NULL,
	"client_id" text NOT NULL,
	"name" text NOT NULL,
	"email" text DEFAULT '' NOT NULL,
	"phone" text DEFAULT '' NOT NULL,
	"role" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "client_invitation" (
	"invitation_id" text PRIMARY KEY NOT NULL,
	"client_id" text NOT NULL,
	"contact_id" text
);
--> statement-breakpoint
CREATE TABLE "client_member" (
	"member_id" text PRIMARY KEY NOT NULL,
	"client_id" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "access_point" (
	"id" text PRIMARY KEY NOT NULL,
	"organization_id" text NOT NULL,
	"site_id" text NOT NULL,
	"position" integer DEFAULT 0 NOT NULL,
	"name" text NOT NULL,
	"kind" text NOT NULL,
	"x" double precision NOT NULL,
	"y" double precision NOT NULL,
	"z" double precision DEFAULT 0 NOT NULL,
	"locked" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "obstruction" (
	"id" text PRIMARY KEY NOT NULL,
	"organization_id" text NOT NULL,
	"site_id" text NOT NULL,
	"position" integer DEFAULT 0 NOT NULL,
	"name" text NOT NULL,
	"polygon" jsonb NOT NULL,
	"base_m" double precision DEFAULT 0 NOT NULL,
	"height_m" double precision NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "site" (
	"id" text PRIMARY KEY NOT NULL,
	"organization_id" text NOT NULL,
	"client_id" text,
	"name" text NOT NULL,
	"kind" text NOT NULL,
	"address" text DEFAULT '' NOT NULL,
	"city" text DEFAULT '' NOT NULL,
	"latitude" double precision,
	"longitude" double precision,
	"datum_note" text DEFAULT '' NOT NULL,
	"access_notes" text DEFAULT '' NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "site_backdrop" (
	"site_id" text PRIMARY KEY NOT NULL,
	"organization_id" text NOT NULL,
	"file_id" text NOT NULL,
	"width_px" integer NOT NULL,
	"height_px" integer NOT NULL,
	"p1" jsonb NOT NULL,
	"p2" jsonb NOT NULL,
	"distance_m" double precision NOT NULL,
	"origin_x" double precision DEFAULT 0 NOT NULL,
	"origin_y" double precision DEFAULT 0 NOT NULL,
	"rotation_deg" double precision DEFAULT 0 NOT NULL,
	"opacity" double precision DEFAULT 0.5 NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "surface" (
	"id" text PRIMARY KEY NOT NULL,
	"organization_id" text NOT NULL,
	"site_id" text NOT NULL,
	"position" integer DEFAULT 0 NOT NULL,
	"name" text NOT NULL,
	"kind" text NOT NULL,
	"polygon" jsonb,
	"line" jsonb,
	"elevation_m" double precision,
	"bottom_m" double precision,
	"top_m" double precision,
	"access" text DEFAULT 'public' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "antenna_pattern" (
	"id" text PRIMARY KEY NOT NULL,
	"organization_id" text NOT NULL,
	"name" text NOT NULL,
	"maker" text DEFAULT '' NOT NULL,
	"model" text DEFAULT '' NOT NULL,
	"kind" text NOT NULL,
	"gain_dbi" double precision,
	"frequency_mhz" double precision,
	"h_beamwidth_deg" double precision,
	"v_beamwidth_deg" double precision,
	"pattern" jsonb NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "emitter" (
	"id" text PRIMARY KEY NOT NULL,
	"organization_id" text NOT NULL,
	"site_id" text NOT NULL,
	"position" integer DEFAULT 0 NOT NULL,
	"label" text NOT NULL,
	"operator" text DEFAULT '' NOT NULL,
	"band" text DEFAULT '' NOT NULL,
	"frequency_mhz" double precision NOT NULL,
	"power_per_carrier_w" double precision NOT NULL,
	"power_unit" text DEFAULT 'W' NOT NULL,
	"carriers" integer DEFAULT 1 NOT NULL,
	"loss_db" double precision DEFAULT 0 NOT NULL,
	"gain_dbi" double precision NOT NULL,
	"gain_unit" text DEFAULT 'dBi' NOT NULL,
	"pattern_id" text,
	"pattern" jsonb,
	"h_beamwidth_deg" double precision,
	"v_beamwidth_deg" double precision,
	"azimuth_deg" double precision DEFAULT 0 NOT NULL,
	"mechanical_tilt_deg" double precision DEFAULT 0 NOT NULL,
	"electrical_tilt_deg" double precision DEFAULT 0 NOT NULL,
	"x" double precision NOT NULL,
	"y" double precision NOT NULL,
	"z" double precision NOT NULL,
	"model" text DEFAULT 'spherical' NOT NULL,
	"aperture_m" double precision,
	"dish_diameter_m" double precision,
	"duty_factor" double precision DEFAULT 1 NOT NULL,
	"actual_max_factor" double precision DEFAULT 1 NOT NULL,
	"tdd_factor" double precision DEFAULT 1 NOT NULL,
	"active" boolean DEFAULT true NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "photo" (
	"id" text PRIMARY KEY NOT NULL,
	"organization_id" text NOT NULL,
	"visit_id" text NOT NULL,
	"file_id" text NOT NULL,
	"thumb_file_id" text NOT NULL,
	"caption" text DEFAULT '' NOT NULL,
	"width_px" integer NOT NULL,
	"height_px" integer NOT NULL,
	"taken_at" timestamp with time zone,
	"latitude" double precision,
	"longitude" double precision,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "reading" (
	"id" text PRIMARY KEY NOT NULL,
	"organization_id" text NOT NULL,
	"visit_id" text NOT NULL,
	"surface_id" text,
	"label" text DEFAULT '' NOT NULL,
	"x" double precision NOT NULL,
	"y" double precision NOT NULL,
	"height_m" double precision NOT NULL,
	"value" double precision NOT NULL,
	"unit" text NOT NULL,
	"percent_standard" text,
	"percent_tier" text,
	"frequency_mhz" double precision,
	"power_density_wm2" double precision,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "visit" (
	"id" text PRIMARY KEY NOT NULL,
	"organization_id" text NOT NULL,
	"site_id" text NOT NULL,
	"visited_on" date NOT NULL,
	"people" text DEFAULT '' NOT NULL,
	"conditions" text DEFAULT '' NOT NULL,
	"instruments" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "api_token" (
	"id" text PRIMARY KEY NOT NULL,
	"organization_id" text NOT NULL,
	"member_id" text NOT NULL,
	"user_id" text NOT NULL,
	"name" text NOT NULL,
	"token_hash" text NOT NULL,
	"prefix" text NOT NULL,
	"last_used_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "api_token_token_hash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
ALTER TABLE "audit_event" ADD COLUMN "site_id" text;--> statement-breakpoint
ALTER TABLE "audit_event" ADD COLUMN "before" jsonb;--> statement-breakpoint
ALTER TABLE "audit_event" ADD COLUMN "after" jsonb;--> statement-breakpoint
ALTER TABLE "stored_file" ADD CONSTRAINT "stored_file_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client" ADD CONSTRAINT "client_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client_contact" ADD CONSTRAINT "client_contact_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client_contact" ADD CONSTRAINT "client_contact_client_id_client_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."client"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client_invitation" ADD CONSTRAINT "client_invitation_invitation_id_invitation_id_fk" FOREIGN KEY ("invitation_id") REFERENCES "public"."invitation"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client_invitation" ADD CONSTRAINT "client_invitation_client_id_client_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."client"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client_invitation" ADD CONSTRAINT "client_invitation_contact_id_client_contact_id_fk" FOREIGN KEY ("contact_id") REFERENCES "public"."client_contact"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client_member" ADD CONSTRAINT "client_member_member_id_member_id_fk" FOREIGN KEY ("member_id") REFERENCES "public"."member"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client_member" ADD CONSTRAINT "client_member_client_id_client_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."client"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "access_point" ADD CONSTRAINT "access_point_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "access_point" ADD CONSTRAINT "access_point_site_id_site_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."site"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "obstruction" ADD CONSTRAINT "obstruction_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "obstruction" ADD CONSTRAINT "obstruction_site_id_site_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."site"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "site" ADD CONSTRAINT "site_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "site" ADD CONSTRAINT "site_client_id_client_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."client"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "site_backdrop" ADD CONSTRAINT "site_backdrop_site_id_site_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."site"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "site_backdrop" ADD CONSTRAINT "site_backdrop_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "site_backdrop" ADD CONSTRAINT "site_backdrop_file_id_stored_file_id_fk" FOREIGN KEY ("file_id") REFERENCES "public"."stored_file"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "surface" ADD CONSTRAINT "surface_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "surface" ADD CONSTRAINT "surface_site_id_site_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."site"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "antenna_pattern" ADD CONSTRAINT "antenna_pattern_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "emitter" ADD CONSTRAINT "emitter_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "emitter" ADD CONSTRAINT "emitter_site_id_site_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."site"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "emitter" ADD CONSTRAINT "emitter_pattern_id_antenna_pattern_id_fk" FOREIGN KEY ("pattern_id") REFERENCES "public"."antenna_pattern"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photo" ADD CONSTRAINT "photo_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photo" ADD CONSTRAINT "photo_visit_id_visit_id_fk" FOREIGN KEY ("visit_id") REFERENCES "public"."visit"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photo" ADD CONSTRAINT "photo_file_id_stored_file_id_fk" FOREIGN KEY ("file_id") REFERENCES "public"."stored_file"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photo" ADD CONSTRAINT "photo_thumb_file_id_stored_file_id_fk" FOREIGN KEY ("thumb_file_id") REFERENCES "public"."stored_file"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reading" ADD CONSTRAINT "reading_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reading" ADD CONSTRAINT "reading_visit_id_visit_id_fk" FOREIGN KEY ("visit_id") REFERENCES "public"."visit"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reading" ADD CONSTRAINT "reading_surface_id_surface_id_fk" FOREIGN KEY ("surface_id") REFERENCES "public"."surface"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visit" ADD CONSTRAINT "visit_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "visit" ADD CONSTRAINT "visit_site_id_site_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."site"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "api_token" ADD CONSTRAINT "api_token_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "api_token" ADD CONSTRAINT "api_token_member_id_member_id_fk" FOREIGN KEY ("member_id") REFERENCES "public"."member"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "api_token" ADD CONSTRAINT "api_token_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "stored_file_org_idx" ON "stored_file" USING btree ("organization_id");--> statement-breakpoint
CREATE INDEX "client_org_name_idx" ON "client" USING btree ("organization_id","name");--> statement-breakpoint
CREATE INDEX "client_contact_client_idx" ON "client_contact" USING btree ("client_id");--> statement-breakpoint
CREATE INDEX "client_member_client_idx" ON "client_member" USING btree ("client_id");--> statement-breakpoint
CREATE INDEX "access_point_site_idx" ON "access_point" USING btree ("site_id");--> statement-breakpoint
CREATE INDEX "obstruction_site_idx" ON "obstruction" USING btree ("site_id");--> statement-breakpoint
CREATE INDEX "site_org_name_idx" ON "site" USING btree ("organization_id","name");--> statement-breakpoint
CREATE INDEX "site_org_updated_idx" ON "site" USING btree ("organization_id","updated_at");--> statement-breakpoint
CREATE INDEX "site_client_idx" ON "site" USING btree ("client_id");--> statement-breakpoint
CREATE INDEX "surface_site_idx" ON "surface" USING btree ("site_id");--> statement-breakpoint
CREATE INDEX "antenna_pattern_org_idx" ON "antenna_pattern" USING btree ("organization_id","name");--> statement-breakpoint
CREATE INDEX "emitter_site_idx" ON "emitter" USING btree ("site_id","position");--> statement-breakpoint
CREATE INDEX "emitter_pattern_idx" ON "emitter" USING btree ("pattern_id");--> statement-breakpoint
CREATE INDEX "photo_visit_idx" ON "photo" USING btree ("visit_id");--> statement-breakpoint
CREATE INDEX "reading_visit_idx" ON "reading" USING btree ("visit_id");--> statement-breakpoint
CREATE INDEX "visit_site_idx" ON "visit" USING btree ("site_id","visited_on");--> statement-breakpoint
CREATE INDEX "api_token_member_idx" ON "api_token" USING btree ("member_id");--> statement-breakpoint
CREATE INDEX "audit_site_time_idx" ON "audit_event" USING btree ("site_id","created_at");--> statement-breakpoint
CREATE INDEX "audit_org_subject_idx" ON "audit_event" USING btree ("organization_id","subject_type","created_at");
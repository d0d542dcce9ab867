CREATE TABLE "capture_frame" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"owner_id" text NOT NULL,
	"fingerprint" text NOT NULL,
	"file_name" text NOT NULL,
	"frame_type" text NOT NULL,
	"object" text,
	"taken_at" timestamp with time zone NOT NULL,
	"night_date" text NOT NULL,
	"exposure_s" double precision NOT NULL,
	"filter" text,
	"gain" double precision,
	"offset" double precision,
	"binning" integer DEFAULT 1 NOT NULL,
	"readout_mode" text,
	"set_temp_c" double precision,
	"sensor_temp_c" double precision,
	"focuser_position_steps" integer,
	"rotator_angle_deg" double precision,
	"pier_side" text,
	"pointing_ra_deg" double precision,
	"pointing_dec_deg" double precision,
	"wcs_ra_deg" double precision,
	"wcs_dec_deg" double precision,
	"wcs_position_angle_deg" double precision,
	"wcs_scale_arcsec_per_px" double precision,
	"wcs_mirrored" boolean,
	"intake_id" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "capture_share" (
	"owner_id" text NOT NULL,
	"target_id" uuid NOT NULL,
	"organization_id" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "dark_set" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"owner_id" text NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"exposure_s" double precision NOT NULL,
	"gain" double precision,
	"offset" double precision,
	"binning" integer DEFAULT 1 NOT NULL,
	"readout_mode" text,
	"temperature_c" double precision NOT NULL,
	"frames" integer NOT NULL,
	"taken_on" text NOT NULL,
	"notes" text DEFAULT '' NOT NULL
);
--> statement-breakpoint
ALTER TABLE "user_settings" ADD COLUMN "dark_validity_months" integer DEFAULT 6 NOT NULL;--> statement-breakpoint
ALTER TABLE "capture_frame" ADD CONSTRAINT "capture_frame_owner_id_user_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "capture_share" ADD CONSTRAINT "capture_share_owner_id_user_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "capture_share" ADD CONSTRAINT "capture_share_target_id_target_id_fk" FOREIGN KEY ("target_id") REFERENCES "public"."target"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "capture_share" ADD CONSTRAINT "capture_share_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dark_set" ADD CONSTRAINT "dark_set_owner_id_user_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "capture_frame_owner_fingerprint_idx" ON "capture_frame" USING btree ("owner_id","fingerprint");--> statement-breakpoint
CREATE INDEX "capture_frame_owner_type_night_idx" ON "capture_frame" USING btree ("owner_id","frame_type","night_date");--> statement-breakpoint
CREATE UNIQUE INDEX "capture_share_target_org_idx" ON "capture_share" USING btree ("target_id","organization_id");--> statement-breakpoint
CREATE INDEX "capture_share_org_idx" ON "capture_share" USING btree ("organization_id");--> statement-breakpoint
CREATE INDEX "dark_set_owner_idx" ON "dark_set" USING btree ("owner_id");
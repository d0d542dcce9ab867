CREATE TABLE "catalogue" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"owner_id" text NOT NULL,
	"club_id" text,
	"name" text NOT NULL,
	"object_count" integer DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "catalogue_object" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"catalogue_id" uuid NOT NULL,
	"designation" text NOT NULL,
	"aliases" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"name" text DEFAULT '' NOT NULL,
	"type" text NOT NULL,
	"ra_deg" double precision NOT NULL,
	"dec_deg" double precision NOT NULL,
	"major_arcmin" double precision,
	"minor_arcmin" double precision,
	"position_angle_deg" double precision,
	"magnitude" double precision,
	"search_key" text NOT NULL
);
--> statement-breakpoint
CREATE TABLE "framing" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"target_id" uuid NOT NULL,
	"name" text NOT NULL,
	"ra_deg" double precision NOT NULL,
	"dec_deg" double precision NOT NULL,
	"position_angle_deg" double precision DEFAULT 0 NOT NULL,
	"mosaic_cols" integer DEFAULT 1 NOT NULL,
	"mosaic_rows" integer DEFAULT 1 NOT NULL,
	"overlap_pct" double precision DEFAULT 10 NOT NULL,
	"rig_id" uuid,
	"source" text DEFAULT 'manual' NOT NULL,
	"source_detail" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "rig" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"owner_id" text NOT NULL,
	"name" text NOT NULL,
	"spec" jsonb NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "target" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"owner_id" text NOT NULL,
	"designation" text NOT NULL,
	"name" text DEFAULT '' NOT NULL,
	"type" text DEFAULT 'other' NOT NULL,
	"ra_deg" double precision NOT NULL,
	"dec_deg" double precision NOT NULL,
	"major_arcmin" double precision,
	"minor_arcmin" double precision,
	"position_angle_deg" double precision,
	"magnitude" double precision,
	"notes" text DEFAULT '' NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "site" ADD COLUMN "min_altitude_deg" double precision DEFAULT 30 NOT NULL;--> statement-breakpoint
ALTER TABLE "site" ADD COLUMN "dusk_temp_c" double precision DEFAULT 10 NOT NULL;--> statement-breakpoint
ALTER TABLE "site" ADD COLUMN "dawn_temp_c" double precision DEFAULT 5 NOT NULL;--> statement-breakpoint
ALTER TABLE "site" ADD COLUMN "horizon" jsonb DEFAULT '[]'::jsonb NOT NULL;--> statement-breakpoint
ALTER TABLE "catalogue" ADD CONSTRAINT "catalogue_owner_id_user_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "catalogue" ADD CONSTRAINT "catalogue_club_id_organization_id_fk" FOREIGN KEY ("club_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "catalogue_object" ADD CONSTRAINT "catalogue_object_catalogue_id_catalogue_id_fk" FOREIGN KEY ("catalogue_id") REFERENCES "public"."catalogue"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "framing" ADD CONSTRAINT "framing_target_id_target_id_fk" FOREIGN KEY ("target_id") REFERENCES "public"."target"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "framing" ADD CONSTRAINT "framing_rig_id_rig_id_fk" FOREIGN KEY ("rig_id") REFERENCES "public"."rig"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rig" ADD CONSTRAINT "rig_owner_id_user_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "target" ADD CONSTRAINT "target_owner_id_user_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "catalogue_owner_id_idx" ON "catalogue" USING btree ("owner_id");--> statement-breakpoint
CREATE INDEX "catalogue_club_id_idx" ON "catalogue" USING btree ("club_id");--> statement-breakpoint
CREATE UNIQUE INDEX "catalogue_object_designation_idx" ON "catalogue_object" USING btree ("catalogue_id","designation");--> statement-breakpoint
CREATE INDEX "catalogue_object_catalogue_idx" ON "catalogue_object" USING btree ("catalogue_id");--> statement-breakpoint
CREATE INDEX "framing_target_id_idx" ON "framing" USING btree ("target_id");--> statement-breakpoint
CREATE INDEX "rig_owner_id_idx" ON "rig" USING btree ("owner_id");--> statement-breakpoint
CREATE INDEX "target_owner_id_idx" ON "target" USING btree ("owner_id");
CREATE TABLE "dry_run" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"recipe_id" uuid NOT NULL,
	"owner_id" text NOT NULL,
	"recipe_version" integer NOT NULL,
	"night_date" text NOT NULL,
	"site_id" uuid,
	"rig_id" uuid,
	"night_end" timestamp with time zone,
	"stop_count" integer DEFAULT 0 NOT NULL,
	"warn_count" integer DEFAULT 0 NOT NULL,
	"result" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "dry_run" ADD CONSTRAINT "dry_run_recipe_id_recipe_id_fk" FOREIGN KEY ("recipe_id") REFERENCES "public"."recipe"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dry_run" ADD CONSTRAINT "dry_run_owner_id_user_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dry_run" ADD CONSTRAINT "dry_run_site_id_site_id_fk" FOREIGN KEY ("site_id") REFERENCES "public"."site"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dry_run" ADD CONSTRAINT "dry_run_rig_id_rig_id_fk" FOREIGN KEY ("rig_id") REFERENCES "public"."rig"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "dry_run_recipe_created_idx" ON "dry_run" USING btree ("recipe_id","created_at");
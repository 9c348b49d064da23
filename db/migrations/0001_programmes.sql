CREATE TABLE "consent" (
	"id" text PRIMARY KEY NOT NULL,
	"client_id" text NOT NULL,
	"kind" text NOT NULL,
	"status" text NOT NULL,
	"method" text NOT NULL,
	"note" text,
	"recorded_by_id" text NOT NULL,
	"recorded_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "photo" (
	"id" text PRIMARY KEY NOT NULL,
	"organization_id" text NOT NULL,
	"client_id" text NOT NULL,
	"kind" text NOT NULL,
	"uploaded_by_id" text NOT NULL,
	"content_type" text NOT NULL,
	"width" integer NOT NULL,
	"height" integer NOT NULL,
	"bytes" integer NOT NULL,
	"storage_key" text NOT NULL,
	"thumbnail_key" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "programme" (
	"id" text PRIMARY KEY NOT NULL,
	"client_id" text NOT NULL,
	"draft" jsonb,
	"draft_revision" integer DEFAULT 0 NOT NULL,
	"draft_updated_by_id" text,
	"draft_updated_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "programme_clientId_unique" UNIQUE("client_id")
);
--> statement-breakpoint
CREATE TABLE "programme_template" (
	"id" text PRIMARY KEY NOT NULL,
	"organization_id" text NOT NULL,
	"name" text NOT NULL,
	"description" text,
	"content" jsonb NOT NULL,
	"created_by_id" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "programme_version" (
	"id" text PRIMARY KEY NOT NULL,
	"programme_id" text NOT NULL,
	"number" integer NOT NULL,
	"content" jsonb NOT NULL,
	"reason" text NOT NULL,
	"prompted_by_type" text,
	"prompted_by_id" text,
	"author_id" text NOT NULL,
	"published_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "red_flag_clearance" (
	"id" text PRIMARY KEY NOT NULL,
	"screening_id" text NOT NULL,
	"flag" text NOT NULL,
	"clinician_name" text NOT NULL,
	"note" text NOT NULL,
	"recorded_by_id" text NOT NULL,
	"recorded_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "screening" (
	"id" text PRIMARY KEY NOT NULL,
	"client_id" text NOT NULL,
	"version" integer NOT NULL,
	"answers" jsonb NOT NULL,
	"red_flags" jsonb NOT NULL,
	"outcome" text NOT NULL,
	"rescreen_on" date,
	"signed_by_id" text NOT NULL,
	"signed_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "client" ADD COLUMN "condition" text;--> statement-breakpoint
ALTER TABLE "client" ADD COLUMN "affected_side" text;--> statement-breakpoint
ALTER TABLE "client" ADD COLUMN "goals" text;--> statement-breakpoint
ALTER TABLE "client" ADD COLUMN "onset_date" date;--> statement-breakpoint
ALTER TABLE "consent" ADD CONSTRAINT "consent_client_id_client_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."client"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "consent" ADD CONSTRAINT "consent_recorded_by_id_user_id_fk" FOREIGN KEY ("recorded_by_id") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photo" ADD CONSTRAINT "photo_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photo" ADD CONSTRAINT "photo_client_id_client_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."client"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photo" ADD CONSTRAINT "photo_uploaded_by_id_user_id_fk" FOREIGN KEY ("uploaded_by_id") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "programme" ADD CONSTRAINT "programme_client_id_client_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."client"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "programme" ADD CONSTRAINT "programme_draft_updated_by_id_user_id_fk" FOREIGN KEY ("draft_updated_by_id") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "programme_template" ADD CONSTRAINT "programme_template_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "programme_template" ADD CONSTRAINT "programme_template_created_by_id_user_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "programme_version" ADD CONSTRAINT "programme_version_programme_id_programme_id_fk" FOREIGN KEY ("programme_id") REFERENCES "public"."programme"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "programme_version" ADD CONSTRAINT "programme_version_author_id_user_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "red_flag_clearance" ADD CONSTRAINT "red_flag_clearance_screening_id_screening_id_fk" FOREIGN KEY ("screening_id") REFERENCES "public"."screening"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "red_flag_clearance" ADD CONSTRAINT "red_flag_clearance_recorded_by_id_user_id_fk" FOREIGN KEY ("recorded_by_id") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "screening" ADD CONSTRAINT "screening_client_id_client_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."client"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "screening" ADD CONSTRAINT "screening_signed_by_id_user_id_fk" FOREIGN KEY ("signed_by_id") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "consent_client_idx" ON "consent" USING btree ("client_id","kind","recorded_at");--> statement-breakpoint
CREATE INDEX "photo_client_idx" ON "photo" USING btree ("client_id");--> statement-breakpoint
CREATE UNIQUE INDEX "programme_version_number_idx" ON "programme_version" USING btree ("programme_id","number");--> statement-breakpoint
CREATE UNIQUE INDEX "red_flag_clearance_flag_idx" ON "red_flag_clearance" USING btree ("screening_id","flag");--> statement-breakpoint
CREATE UNIQUE INDEX "screening_client_version_idx" ON "screening" USING btree ("client_id","version");
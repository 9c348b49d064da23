CREATE TABLE "check_in" (
	"id" text PRIMARY KEY NOT NULL,
	"client_id" text NOT NULL,
	"programme_version_id" text,
	"logged_by_id" text NOT NULL,
	"logged_by_role" text NOT NULL,
	"session_date" date NOT NULL,
	"minutes" integer NOT NULL,
	"comfort" integer NOT NULL,
	"movement" text NOT NULL,
	"fatigue" text NOT NULL,
	"channels" jsonb NOT NULL,
	"skin" jsonb NOT NULL,
	"electrode_condition" text DEFAULT 'fine' NOT NULL,
	"notes" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "electrode_pack" (
	"id" text PRIMARY KEY NOT NULL,
	"client_id" text NOT NULL,
	"opened_on" date NOT NULL,
	"recorded_by_id" text NOT NULL,
	"note" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "flag" (
	"id" text PRIMARY KEY NOT NULL,
	"organization_id" text NOT NULL,
	"client_id" text NOT NULL,
	"check_in_id" text,
	"rule" text NOT NULL,
	"severity" text NOT NULL,
	"status" text DEFAULT 'open' NOT NULL,
	"title" text NOT NULL,
	"detail" jsonb,
	"acknowledged_by_id" text,
	"acknowledged_at" timestamp with time zone,
	"resolved_by_id" text,
	"resolved_at" timestamp with time zone,
	"resolution_note" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "check_in" ADD CONSTRAINT "check_in_client_id_client_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."client"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "check_in" ADD CONSTRAINT "check_in_programme_version_id_programme_version_id_fk" FOREIGN KEY ("programme_version_id") REFERENCES "public"."programme_version"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "check_in" ADD CONSTRAINT "check_in_logged_by_id_user_id_fk" FOREIGN KEY ("logged_by_id") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "electrode_pack" ADD CONSTRAINT "electrode_pack_client_id_client_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."client"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "electrode_pack" ADD CONSTRAINT "electrode_pack_recorded_by_id_user_id_fk" FOREIGN KEY ("recorded_by_id") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "flag" ADD CONSTRAINT "flag_organization_id_organization_id_fk" FOREIGN KEY ("organization_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "flag" ADD CONSTRAINT "flag_client_id_client_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."client"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "flag" ADD CONSTRAINT "flag_check_in_id_check_in_id_fk" FOREIGN KEY ("check_in_id") REFERENCES "public"."check_in"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "flag" ADD CONSTRAINT "flag_acknowledged_by_id_user_id_fk" FOREIGN KEY ("acknowledged_by_id") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "flag" ADD CONSTRAINT "flag_resolved_by_id_user_id_fk" FOREIGN KEY ("resolved_by_id") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "check_in_client_idx" ON "check_in" USING btree ("client_id","session_date");--> statement-breakpoint
CREATE INDEX "electrode_pack_client_idx" ON "electrode_pack" USING btree ("client_id","opened_on");--> statement-breakpoint
CREATE INDEX "flag_organization_status_idx" ON "flag" USING btree ("organization_id","status","created_at");--> statement-breakpoint
CREATE INDEX "flag_client_idx" ON "flag" USING btree ("client_id");
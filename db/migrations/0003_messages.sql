CREATE TABLE "message" (
	"id" text PRIMARY KEY NOT NULL,
	"client_id" text NOT NULL,
	"author_id" text,
	"kind" text DEFAULT 'message' NOT NULL,
	"body" text NOT NULL,
	"photo_ids" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"about_type" text,
	"about_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "notification_setting" (
	"user_id" text PRIMARY KEY NOT NULL,
	"email_messages" boolean DEFAULT true NOT NULL,
	"email_programme_updates" boolean DEFAULT true NOT NULL,
	"email_flags" boolean DEFAULT true NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "thread_read" (
	"client_id" text NOT NULL,
	"user_id" text NOT NULL,
	"last_read_at" timestamp with time zone NOT NULL,
	"last_notified_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "version_confirmation" (
	"id" text PRIMARY KEY NOT NULL,
	"programme_version_id" text NOT NULL,
	"confirmed_by_id" text NOT NULL,
	"confirmed_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "message" ADD CONSTRAINT "message_client_id_client_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."client"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "message" ADD CONSTRAINT "message_author_id_user_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "notification_setting" ADD CONSTRAINT "notification_setting_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "thread_read" ADD CONSTRAINT "thread_read_client_id_client_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."client"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "thread_read" ADD CONSTRAINT "thread_read_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "version_confirmation" ADD CONSTRAINT "version_confirmation_programme_version_id_programme_version_id_fk" FOREIGN KEY ("programme_version_id") REFERENCES "public"."programme_version"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "version_confirmation" ADD CONSTRAINT "version_confirmation_confirmed_by_id_user_id_fk" FOREIGN KEY ("confirmed_by_id") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "message_client_idx" ON "message" USING btree ("client_id","created_at");--> statement-breakpoint
CREATE UNIQUE INDEX "thread_read_client_user_idx" ON "thread_read" USING btree ("client_id","user_id");--> statement-breakpoint
CREATE UNIQUE INDEX "version_confirmation_idx" ON "version_confirmation" USING btree ("programme_version_id","confirmed_by_id");
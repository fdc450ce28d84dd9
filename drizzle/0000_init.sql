CREATE TABLE "frame_schedules" (
	"id" serial PRIMARY KEY NOT NULL,
	"name" text NOT NULL,
	"customer_name" text DEFAULT '' NOT NULL,
	"unit" text DEFAULT 'mm' NOT NULL,
	"panels" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"created_by" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "job_items" (
	"id" serial PRIMARY KEY NOT NULL,
	"job_id" integer NOT NULL,
	"section_id" integer NOT NULL,
	"length_mm" integer NOT NULL,
	"quantity" integer NOT NULL,
	"label" text DEFAULT '' NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"angle_tenths" integer,
	"position" integer DEFAULT 0 NOT NULL
);
--> statement-breakpoint
CREATE TABLE "jobs" (
	"id" serial PRIMARY KEY NOT NULL,
	"reference" text NOT NULL,
	"customer_name" text NOT NULL,
	"customer_email" text DEFAULT '' NOT NULL,
	"customer_phone" text DEFAULT '' NOT NULL,
	"due_date" date,
	"status" text DEFAULT 'draft' NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"office_flag" text,
	"frame_schedule_id" integer,
	"created_by" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "jobs_reference_unique" UNIQUE("reference")
);
--> statement-breakpoint
CREATE TABLE "offcuts" (
	"id" serial PRIMARY KEY NOT NULL,
	"tag" text NOT NULL,
	"section_id" integer NOT NULL,
	"length_mm" integer NOT NULL,
	"location" text DEFAULT '' NOT NULL,
	"status" text DEFAULT 'available' NOT NULL,
	"origin" text DEFAULT '' NOT NULL,
	"origin_plan_id" integer,
	"reserved_by_plan_id" integer,
	"scrap_reason" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "offcuts_tag_unique" UNIQUE("tag")
);
--> statement-breakpoint
CREATE TABLE "plan_boards" (
	"id" serial PRIMARY KEY NOT NULL,
	"plan_id" integer NOT NULL,
	"board_no" integer NOT NULL,
	"section_id" integer NOT NULL,
	"source" text NOT NULL,
	"stock_length_id" integer,
	"offcut_id" integer,
	"length_mm" integer NOT NULL,
	"trim_mm" integer DEFAULT 0 NOT NULL,
	"pieces" jsonb NOT NULL,
	"remainder_mm" integer NOT NULL,
	"keep_remainder" boolean NOT NULL,
	"status" text DEFAULT 'pending' NOT NULL,
	"done_at" timestamp with time zone,
	"done_by" integer,
	"new_offcut_id" integer,
	"defect_reason" text
);
--> statement-breakpoint
CREATE TABLE "plans" (
	"id" serial PRIMARY KEY NOT NULL,
	"job_id" integer NOT NULL,
	"status" text DEFAULT 'planned' NOT NULL,
	"settings" jsonb NOT NULL,
	"sections" jsonb NOT NULL,
	"totals" jsonb NOT NULL,
	"price_pence" integer DEFAULT 0 NOT NULL,
	"price" jsonb,
	"created_by" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"released_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "sections" (
	"id" serial PRIMARY KEY NOT NULL,
	"code" text NOT NULL,
	"name" text NOT NULL,
	"thickness_mm" integer NOT NULL,
	"width_mm" integer NOT NULL,
	"species" text DEFAULT '' NOT NULL,
	"grade" text DEFAULT '' NOT NULL,
	"treatment" text DEFAULT '' NOT NULL,
	"finish" text DEFAULT 'sawn' NOT NULL,
	"active" boolean DEFAULT true NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "sections_code_unique" UNIQUE("code")
);
--> statement-breakpoint
CREATE TABLE "sent_mail" (
	"id" serial PRIMARY KEY NOT NULL,
	"job_id" integer,
	"to" text NOT NULL,
	"subject" text NOT NULL,
	"status" text NOT NULL,
	"error" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "stock_lengths" (
	"id" serial PRIMARY KEY NOT NULL,
	"section_id" integer NOT NULL,
	"length_mm" integer NOT NULL,
	"price_pence" integer NOT NULL,
	"on_hand" integer,
	"active" boolean DEFAULT true NOT NULL
);
--> statement-breakpoint
CREATE TABLE "stock_movements" (
	"id" serial PRIMARY KEY NOT NULL,
	"at" timestamp with time zone DEFAULT now() NOT NULL,
	"kind" text NOT NULL,
	"user_id" integer,
	"section_id" integer NOT NULL,
	"stock_length_id" integer,
	"offcut_id" integer,
	"quantity_delta" integer DEFAULT 0 NOT NULL,
	"length_mm" integer NOT NULL,
	"value_pence" integer DEFAULT 0 NOT NULL,
	"plan_id" integer,
	"job_id" integer,
	"reason" text DEFAULT '' NOT NULL
);
--> statement-breakpoint
CREATE TABLE "users" (
	"id" serial PRIMARY KEY NOT NULL,
	"email" text NOT NULL,
	"name" text NOT NULL,
	"role" text NOT NULL,
	"password_hash" text NOT NULL,
	"disabled" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "users_email_unique" UNIQUE("email")
);
--> statement-breakpoint
CREATE TABLE "yard_settings" (
	"id" integer PRIMARY KEY DEFAULT 1 NOT NULL,
	"yard_name" text NOT NULL,
	"kerf_mm" integer DEFAULT 3 NOT NULL,
	"trim_mm" integer DEFAULT 5 NOT NULL,
	"min_offcut_mm" integer DEFAULT 300 NOT NULL,
	"display_unit" text DEFAULT 'mm' NOT NULL,
	"per_cut_charge_pence" integer DEFAULT 25 NOT NULL,
	"clear_offcuts_after_days" integer DEFAULT 90 NOT NULL,
	"length_tolerance_mm" integer DEFAULT 2 NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "frame_schedules" ADD CONSTRAINT "frame_schedules_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "job_items" ADD CONSTRAINT "job_items_job_id_jobs_id_fk" FOREIGN KEY ("job_id") REFERENCES "public"."jobs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "job_items" ADD CONSTRAINT "job_items_section_id_sections_id_fk" FOREIGN KEY ("section_id") REFERENCES "public"."sections"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_frame_schedule_id_frame_schedules_id_fk" FOREIGN KEY ("frame_schedule_id") REFERENCES "public"."frame_schedules"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "offcuts" ADD CONSTRAINT "offcuts_section_id_sections_id_fk" FOREIGN KEY ("section_id") REFERENCES "public"."sections"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_boards" ADD CONSTRAINT "plan_boards_plan_id_plans_id_fk" FOREIGN KEY ("plan_id") REFERENCES "public"."plans"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_boards" ADD CONSTRAINT "plan_boards_section_id_sections_id_fk" FOREIGN KEY ("section_id") REFERENCES "public"."sections"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_boards" ADD CONSTRAINT "plan_boards_stock_length_id_stock_lengths_id_fk" FOREIGN KEY ("stock_length_id") REFERENCES "public"."stock_lengths"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_boards" ADD CONSTRAINT "plan_boards_offcut_id_offcuts_id_fk" FOREIGN KEY ("offcut_id") REFERENCES "public"."offcuts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_boards" ADD CONSTRAINT "plan_boards_done_by_users_id_fk" FOREIGN KEY ("done_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_boards" ADD CONSTRAINT "plan_boards_new_offcut_id_offcuts_id_fk" FOREIGN KEY ("new_offcut_id") REFERENCES "public"."offcuts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_job_id_jobs_id_fk" FOREIGN KEY ("job_id") REFERENCES "public"."jobs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sent_mail" ADD CONSTRAINT "sent_mail_job_id_jobs_id_fk" FOREIGN KEY ("job_id") REFERENCES "public"."jobs"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_lengths" ADD CONSTRAINT "stock_lengths_section_id_sections_id_fk" FOREIGN KEY ("section_id") REFERENCES "public"."sections"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_section_id_sections_id_fk" FOREIGN KEY ("section_id") REFERENCES "public"."sections"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_stock_length_id_stock_lengths_id_fk" FOREIGN KEY ("stock_length_id") REFERENCES "public"."stock_lengths"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_offcut_id_offcuts_id_fk" FOREIGN KEY ("offcut_id") REFERENCES "public"."offcuts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_plan_id_plans_id_fk" FOREIGN KEY ("plan_id") REFERENCES "public"."plans"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_job_id_jobs_id_fk" FOREIGN KEY ("job_id") REFERENCES "public"."jobs"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "offcuts_section_status" ON "offcuts" USING btree ("section_id","status");--> statement-breakpoint
CREATE UNIQUE INDEX "plan_boards_plan_board" ON "plan_boards" USING btree ("plan_id","board_no");--> statement-breakpoint
CREATE UNIQUE INDEX "stock_lengths_section_length" ON "stock_lengths" USING btree ("section_id","length_mm");--> statement-breakpoint
CREATE INDEX "stock_movements_at" ON "stock_movements" USING btree ("at");--> statement-breakpoint
CREATE INDEX "stock_movements_section" ON "stock_movements" USING btree ("section_id");
ALTER TABLE "frame_schedules" ADD COLUMN "customer_email" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "job_items" ADD COLUMN "marks" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "job_items" ADD COLUMN "frame_schedule_id" integer;--> statement-breakpoint
ALTER TABLE "sections" ADD COLUMN "finished_thickness_mm" integer;--> statement-breakpoint
ALTER TABLE "sections" ADD COLUMN "finished_width_mm" integer;--> statement-breakpoint
ALTER TABLE "sections" ADD COLUMN "moisture" text DEFAULT 'kiln_dried' NOT NULL;--> statement-breakpoint
ALTER TABLE "sections" ADD COLUMN "min_keep_mm" integer;--> statement-breakpoint
ALTER TABLE "stock_lengths" ADD COLUMN "cost_pence" integer;--> statement-breakpoint
ALTER TABLE "yard_settings" ADD COLUMN "region" text DEFAULT 'uk' NOT NULL;--> statement-breakpoint
ALTER TABLE "yard_settings" ADD COLUMN "min_safe_piece_mm" integer DEFAULT 150 NOT NULL;--> statement-breakpoint
ALTER TABLE "job_items" ADD CONSTRAINT "job_items_frame_schedule_id_frame_schedules_id_fk" FOREIGN KEY ("frame_schedule_id") REFERENCES "public"."frame_schedules"("id") ON DELETE set null ON UPDATE no action;
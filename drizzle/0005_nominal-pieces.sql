ALTER TABLE "yard_settings" ALTER COLUMN "length_tolerance_mm" SET DEFAULT 5;--> statement-breakpoint
ALTER TABLE "job_items" ADD COLUMN "tolerance_mm" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "plan_boards" ADD COLUMN "full_length" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "sections" ADD COLUMN "nominal_tolerance_mm" integer;--> statement-breakpoint
-- The yard's length tolerance was stored but never used; the old default (2) becomes the new one (5).
UPDATE "yard_settings" SET "length_tolerance_mm" = 5 WHERE "length_tolerance_mm" = 2;

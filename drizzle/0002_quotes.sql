CREATE TABLE "customers" (
	"id" serial PRIMARY KEY NOT NULL,
	"name" text NOT NULL,
	"contact" text DEFAULT '' NOT NULL,
	"phone" text DEFAULT '' NOT NULL,
	"email" text DEFAULT '' NOT NULL,
	"address" text DEFAULT '' NOT NULL,
	"account" text DEFAULT 'retail' NOT NULL,
	"credit_days" integer,
	"discount_percent" integer DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "payments" (
	"id" serial PRIMARY KEY NOT NULL,
	"at" timestamp with time zone DEFAULT now() NOT NULL,
	"job_id" integer NOT NULL,
	"quote_id" integer,
	"kind" text NOT NULL,
	"status" text NOT NULL,
	"amount_pence" integer NOT NULL,
	"by_name" text DEFAULT '' NOT NULL,
	"user_id" integer,
	"event_id" text,
	"checkout_session_id" text,
	"payment_intent_id" text,
	"note" text DEFAULT '' NOT NULL,
	CONSTRAINT "payments_event_id_unique" UNIQUE("event_id")
);
--> statement-breakpoint
CREATE TABLE "quote_links" (
	"id" serial PRIMARY KEY NOT NULL,
	"quote_id" integer NOT NULL,
	"token_hash" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"revoked_at" timestamp with time zone,
	"created_by" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "quote_links_token_hash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
CREATE TABLE "quotes" (
	"id" serial PRIMARY KEY NOT NULL,
	"plan_id" integer NOT NULL,
	"job_id" integer NOT NULL,
	"number" text NOT NULL,
	"version" integer NOT NULL,
	"account" text NOT NULL,
	"lines" jsonb NOT NULL,
	"net_pence" integer NOT NULL,
	"vat_pence" integer NOT NULL,
	"gross_pence" integer NOT NULL,
	"vat_rate_basis_points" integer NOT NULL,
	"deposit_pence" integer NOT NULL,
	"valid_until" timestamp with time zone NOT NULL,
	"accepted_at" timestamp with time zone,
	"accepted_name" text,
	"accepted_ip" text,
	"on_account" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "quotes_plan_id_unique" UNIQUE("plan_id"),
	CONSTRAINT "quotes_number_unique" UNIQUE("number")
);
--> statement-breakpoint
ALTER TABLE "jobs" ADD COLUMN "customer_id" integer;--> statement-breakpoint
ALTER TABLE "jobs" ADD COLUMN "delivery_charge_pence" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "plans" ADD COLUMN "release_override_reason" text;--> statement-breakpoint
ALTER TABLE "plans" ADD COLUMN "release_override_by" integer;--> statement-breakpoint
ALTER TABLE "yard_settings" ADD COLUMN "vat_rate_basis_points" integer DEFAULT 2000 NOT NULL;--> statement-breakpoint
ALTER TABLE "yard_settings" ADD COLUMN "yard_address" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "yard_settings" ADD COLUMN "vat_number" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "yard_settings" ADD COLUMN "quote_validity_days" integer DEFAULT 30 NOT NULL;--> statement-breakpoint
ALTER TABLE "yard_settings" ADD COLUMN "minimum_charge_pence" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "yard_settings" ADD COLUMN "offcut_rate_percent" integer DEFAULT 50 NOT NULL;--> statement-breakpoint
ALTER TABLE "yard_settings" ADD COLUMN "remainders_go_to" text DEFAULT 'yard' NOT NULL;--> statement-breakpoint
ALTER TABLE "yard_settings" ADD COLUMN "deposit_percent" integer DEFAULT 50 NOT NULL;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_job_id_jobs_id_fk" FOREIGN KEY ("job_id") REFERENCES "public"."jobs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_quote_id_quotes_id_fk" FOREIGN KEY ("quote_id") REFERENCES "public"."quotes"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quote_links" ADD CONSTRAINT "quote_links_quote_id_quotes_id_fk" FOREIGN KEY ("quote_id") REFERENCES "public"."quotes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quote_links" ADD CONSTRAINT "quote_links_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotes" ADD CONSTRAINT "quotes_plan_id_plans_id_fk" FOREIGN KEY ("plan_id") REFERENCES "public"."plans"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotes" ADD CONSTRAINT "quotes_job_id_jobs_id_fk" FOREIGN KEY ("job_id") REFERENCES "public"."jobs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "payments_job" ON "payments" USING btree ("job_id");--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_customer_id_customers_id_fk" FOREIGN KEY ("customer_id") REFERENCES "public"."customers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_release_override_by_users_id_fk" FOREIGN KEY ("release_override_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
-- Existing jobs' free-text customers become customer records (one per distinct name, e-mail and phone
-- taken from that customer's most recent job), and each job points at its record.
INSERT INTO "customers" ("name", "email", "phone")
SELECT DISTINCT ON (lower(trim("customer_name"))) trim("customer_name"), "customer_email", "customer_phone"
FROM "jobs" WHERE trim("customer_name") <> ''
ORDER BY lower(trim("customer_name")), "created_at" DESC;--> statement-breakpoint
UPDATE "jobs" SET "customer_id" = "customers"."id" FROM "customers"
WHERE lower(trim("jobs"."customer_name")) = lower("customers"."name");

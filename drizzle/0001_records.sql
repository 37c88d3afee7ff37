CREATE TYPE "public"."detection" AS ENUM('absorbance', 'fluorescence');--> statement-breakpoint
CREATE TYPE "public"."quantitation" AS ENUM('extinction', 'standard-curve');--> statement-breakpoint
CREATE TYPE "public"."read_mode" AS ENUM('endpoint', 'kinetic');--> statement-breakpoint
CREATE TYPE "public"."study_status" AS ENUM('draft', 'in_review', 'approved', 'returned');--> statement-breakpoint
CREATE TABLE "assays" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"name" text NOT NULL,
	"substrate" text NOT NULL,
	"substrate_mm" double precision NOT NULL,
	"km_mm" double precision,
	"substrate_regime" text DEFAULT 'unknown' NOT NULL,
	"read_mode" "read_mode" NOT NULL,
	"detection" "detection" NOT NULL,
	"wavelength_nm" integer NOT NULL,
	"emission_nm" integer,
	"quantitation" "quantitation" NOT NULL,
	"extinction_coefficient" double precision,
	"extinction_unit" text DEFAULT 'M-1cm-1' NOT NULL,
	"path_length_cm" double precision,
	"well_volume_ul" double precision NOT NULL,
	"temperature_c" double precision NOT NULL,
	"stop_solution" text DEFAULT '' NOT NULL,
	"chromophore_pka" double precision,
	"notes" text DEFAULT '' NOT NULL,
	"created_by" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "buffer_series" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"name" text NOT NULL,
	"input" jsonb NOT NULL,
	"design" jsonb NOT NULL,
	"created_by" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"version" integer DEFAULT 1 NOT NULL
);
--> statement-breakpoint
CREATE TABLE "buffer_systems" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"slug" text NOT NULL,
	"name" text NOT NULL,
	"built_in" boolean DEFAULT false NOT NULL,
	"data" jsonb NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "buffer_systems_slug_unique" UNIQUE("slug")
);
--> statement-breakpoint
CREATE TABLE "enzymes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"name" text NOT NULL,
	"organism" text DEFAULT '' NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_by" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "preparations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"variant_id" uuid NOT NULL,
	"lot" text NOT NULL,
	"protein_mg_per_ml" double precision NOT NULL,
	"prepared_on" date NOT NULL,
	"storage_buffer" text DEFAULT '' NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "studies" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"name" text NOT NULL,
	"enzyme_id" uuid NOT NULL,
	"reference_variant_id" uuid NOT NULL,
	"assay_id" uuid NOT NULL,
	"buffer_series_id" uuid,
	"owner_id" uuid NOT NULL,
	"status" "study_status" DEFAULT 'draft' NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"version" integer DEFAULT 1 NOT NULL
);
--> statement-breakpoint
CREATE TABLE "study_variants" (
	"study_id" uuid NOT NULL,
	"variant_id" uuid NOT NULL,
	"position" integer DEFAULT 0 NOT NULL,
	CONSTRAINT "study_variants_study_id_variant_id_pk" PRIMARY KEY("study_id","variant_id")
);
--> statement-breakpoint
CREATE TABLE "variants" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"team_id" uuid NOT NULL,
	"enzyme_id" uuid NOT NULL,
	"name" text NOT NULL,
	"mutations" text DEFAULT '' NOT NULL,
	"is_parent" boolean DEFAULT false NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "assays" ADD CONSTRAINT "assays_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "assays" ADD CONSTRAINT "assays_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "buffer_series" ADD CONSTRAINT "buffer_series_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "buffer_series" ADD CONSTRAINT "buffer_series_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "buffer_systems" ADD CONSTRAINT "buffer_systems_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "enzymes" ADD CONSTRAINT "enzymes_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "enzymes" ADD CONSTRAINT "enzymes_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "preparations" ADD CONSTRAINT "preparations_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "preparations" ADD CONSTRAINT "preparations_variant_id_variants_id_fk" FOREIGN KEY ("variant_id") REFERENCES "public"."variants"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "studies" ADD CONSTRAINT "studies_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "studies" ADD CONSTRAINT "studies_enzyme_id_enzymes_id_fk" FOREIGN KEY ("enzyme_id") REFERENCES "public"."enzymes"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "studies" ADD CONSTRAINT "studies_reference_variant_id_variants_id_fk" FOREIGN KEY ("reference_variant_id") REFERENCES "public"."variants"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "studies" ADD CONSTRAINT "studies_assay_id_assays_id_fk" FOREIGN KEY ("assay_id") REFERENCES "public"."assays"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "studies" ADD CONSTRAINT "studies_buffer_series_id_buffer_series_id_fk" FOREIGN KEY ("buffer_series_id") REFERENCES "public"."buffer_series"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "studies" ADD CONSTRAINT "studies_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "study_variants" ADD CONSTRAINT "study_variants_study_id_studies_id_fk" FOREIGN KEY ("study_id") REFERENCES "public"."studies"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "study_variants" ADD CONSTRAINT "study_variants_variant_id_variants_id_fk" FOREIGN KEY ("variant_id") REFERENCES "public"."variants"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "variants" ADD CONSTRAINT "variants_team_id_teams_id_fk" FOREIGN KEY ("team_id") REFERENCES "public"."teams"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "variants" ADD CONSTRAINT "variants_enzyme_id_enzymes_id_fk" FOREIGN KEY ("enzyme_id") REFERENCES "public"."enzymes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "variants_enzyme_name_key" ON "variants" USING btree ("enzyme_id","name");
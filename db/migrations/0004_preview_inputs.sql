CREATE TABLE "preview_inputs" (
	"organisation_id" uuid NOT NULL,
	"seq" bigint NOT NULL,
	"verdict_id" uuid NOT NULL,
	"verdict" "verdict_value" NOT NULL,
	"headroom_db" real,
	"profile_slug" text NOT NULL,
	"profile_version" integer NOT NULL,
	"created_at" timestamp with time zone NOT NULL,
	"packed" text NOT NULL,
	CONSTRAINT "preview_inputs_organisation_id_seq_pk" PRIMARY KEY("organisation_id","seq")
);
--> statement-breakpoint
ALTER TABLE "preview_inputs" ADD CONSTRAINT "preview_inputs_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "preview_inputs" ADD CONSTRAINT "preview_inputs_verdict_id_verdicts_id_fk" FOREIGN KEY ("verdict_id") REFERENCES "public"."verdicts"("id") ON DELETE cascade ON UPDATE no action;
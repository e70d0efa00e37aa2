CREATE TABLE "verdict_chain_heads" (
	"organisation_id" uuid PRIMARY KEY NOT NULL,
	"seq" bigint NOT NULL,
	"digest" text NOT NULL,
	"prev_digest" text
);
--> statement-breakpoint
ALTER TABLE "verdict_chain_heads" ADD CONSTRAINT "verdict_chain_heads_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;
-- Published profile versions and verdicts never change once written: replay and the audit chain rely on it.
CREATE OR REPLACE FUNCTION glassgrade_refuse_update() RETURNS trigger AS $$
BEGIN
  RAISE EXCEPTION '% rows are immutable', TG_TABLE_NAME USING ERRCODE = 'check_violation';
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER profile_versions_immutable BEFORE UPDATE ON profile_versions
  FOR EACH ROW EXECUTE FUNCTION glassgrade_refuse_update();
--> statement-breakpoint
CREATE TRIGGER verdicts_immutable BEFORE UPDATE ON verdicts
  FOR EACH ROW EXECUTE FUNCTION glassgrade_refuse_update();

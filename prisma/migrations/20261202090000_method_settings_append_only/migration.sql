-- Method settings versions are only ever added to (a change of settings is a new version): the app's role
-- reads and adds them, never rewrites one (DEVELOPERS, "Records the database protects"). Its triggers refuse
-- UPDATE and DELETE to everyone (20261202073116); this takes the right away from the runtime role as well.
REVOKE UPDATE, DELETE, TRUNCATE ON "MethodSettingsVersion" FROM seepline_runtime;

-- Every audited record table refuses TRUNCATE. The least-privilege migration added that trigger to the
-- tables it found; a database that took a table-creating migration after it (out of order) gets it here.
DO $$
DECLARE
  t record;
BEGIN
  FOR t IN
    SELECT c.relname FROM pg_class c JOIN pg_namespace n ON n.oid = c.relnamespace
    WHERE n.nspname = 'public' AND c.relkind = 'r'
      AND EXISTS (SELECT 1 FROM pg_trigger g WHERE g.tgrelid = c.oid AND g.tgname = 'audit_row')
      AND NOT EXISTS (SELECT 1 FROM pg_trigger g WHERE g.tgrelid = c.oid AND (g.tgtype & 32) <> 0)
  LOOP
    EXECUTE format('CREATE TRIGGER refuse_truncate BEFORE TRUNCATE ON %I FOR EACH STATEMENT EXECUTE FUNCTION seepline_refuse_change()', t.relname);
  END LOOP;
END;
$$;

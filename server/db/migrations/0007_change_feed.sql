-- Change feed: every committed write to a farm table sends NOTIFY rowbench_change with the table's
-- name, so each server instance can drop cached responses and roles as soon as the data changes,
-- whoever wrote it (another instance, a script, psql). A table added later calls rowbench_watch().
CREATE OR REPLACE FUNCTION rowbench_notify_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM pg_notify('rowbench_change', TG_TABLE_NAME);
  RETURN NULL;
END
$$;
--> statement-breakpoint
CREATE OR REPLACE FUNCTION rowbench_watch(tbl regclass) RETURNS void LANGUAGE plpgsql AS $$
BEGIN
  EXECUTE format('DROP TRIGGER IF EXISTS rowbench_change ON %s', tbl);
  EXECUTE format('CREATE TRIGGER rowbench_change AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON %s FOR EACH STATEMENT EXECUTE FUNCTION rowbench_notify_change()', tbl);
END
$$;
--> statement-breakpoint
SELECT rowbench_watch(c.oid::regclass)
FROM pg_class c JOIN pg_namespace n ON n.oid = c.relnamespace
WHERE n.nspname = current_schema() AND c.relkind IN ('r', 'p');

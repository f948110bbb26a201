-- Every write to a table of Heftwise's tells the servers that keep answers between writes
-- (lib/read-cache.ts): on a PostgreSQL server each Heftwise process listens on this channel and
-- forgets what it kept. PostgreSQL delivers a notice only once its transaction commits, and folds
-- the notices of one transaction into one. A table added later gets its trigger in its migration
-- (tests/integration/data-changed.test.ts checks every table has one).
CREATE FUNCTION heftwise_data_changed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM pg_notify('heftwise_data_changed', '');
  RETURN NULL;
END;
$$;--> statement-breakpoint
DO $$
DECLARE t record;
BEGIN
  FOR t IN SELECT tablename FROM pg_tables WHERE schemaname = current_schema() LOOP
    EXECUTE format(
      'CREATE TRIGGER heftwise_data_changed AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON %I FOR EACH STATEMENT EXECUTE FUNCTION heftwise_data_changed()',
      t.tablename
    );
  END LOOP;
END;
$$;

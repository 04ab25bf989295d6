CREATE TABLE "tank_latest_inspections" (
	"tank_id" uuid PRIMARY KEY NOT NULL,
	"org_id" uuid NOT NULL,
	"vessel_id" uuid NOT NULL,
	"inspection_id" uuid NOT NULL,
	"inspected_on" date NOT NULL,
	"revision" integer NOT NULL,
	"rank_table" integer,
	"rank_wording" integer,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "tank_latest_inspections" ADD CONSTRAINT "tank_latest_inspections_tank_id_tanks_id_fk" FOREIGN KEY ("tank_id") REFERENCES "public"."tanks"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tank_latest_inspections" ADD CONSTRAINT "tank_latest_inspections_org_id_organisations_id_fk" FOREIGN KEY ("org_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tank_latest_inspections" ADD CONSTRAINT "tank_latest_inspections_vessel_id_vessels_id_fk" FOREIGN KEY ("vessel_id") REFERENCES "public"."vessels"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tank_latest_inspections" ADD CONSTRAINT "tank_latest_inspections_inspection_id_inspections_id_fk" FOREIGN KEY ("inspection_id") REFERENCES "public"."inspections"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "tank_latest_org_vessel_idx" ON "tank_latest_inspections" USING btree ("org_id","vessel_id");--> statement-breakpoint
CREATE INDEX "tank_latest_inspection_idx" ON "tank_latest_inspections" USING btree ("inspection_id");--> statement-breakpoint
-- The rank of one coating area, 0 GOOD, 1 FAIR, 2 POOR: the thresholds of
-- lib/calc/coating.ts rateCoatingArea (tests/integration/fleet.test.ts checks
-- that the two agree at every threshold). wording: 20 % itself is POOR.
CREATE FUNCTION tw_coating_area_rank(breakdown numeric, rusted numeric, hard_scale numeric, edges_rusted numeric, wording boolean)
RETURNS integer LANGUAGE sql IMMUTABLE AS $$
  SELECT CASE
    WHEN greatest(breakdown, rusted) > 20
      OR (wording AND greatest(breakdown, rusted) >= 20)
      OR hard_scale >= 10
      OR coalesce(edges_rusted, 0) > 50 THEN 2
    WHEN greatest(breakdown, rusted) >= 3
      OR hard_scale > 0
      OR coalesce(edges_rusted, 0) >= 20 THEN 1
    ELSE 0
  END
$$;
--> statement-breakpoint
-- Sets (or removes) one tank's row: its latest countersigned inspection by
-- inspection date, then revision, then countersigning time, and that
-- inspection's worst coating rank.
CREATE FUNCTION tw_refresh_tank_latest(p_tank uuid) RETURNS void LANGUAGE plpgsql AS $$
DECLARE
  latest record;
BEGIN
  SELECT i.id, i.org_id, i.vessel_id, i.inspected_on, i.revision INTO latest
  FROM inspections i
  WHERE i.tank_id = p_tank AND i.status = 'countersigned'
  ORDER BY i.inspected_on DESC, i.revision DESC, i.countersigned_at DESC NULLS LAST, i.id
  LIMIT 1;
  IF NOT FOUND THEN
    DELETE FROM tank_latest_inspections WHERE tank_id = p_tank;
    RETURN;
  END IF;
  INSERT INTO tank_latest_inspections AS t (tank_id, org_id, vessel_id, inspection_id, inspected_on, revision, rank_table, rank_wording, updated_at)
  SELECT p_tank, latest.org_id, latest.vessel_id, latest.id, latest.inspected_on, latest.revision,
         max(tw_coating_area_rank(ca.breakdown_pct, ca.rusted_pct, ca.hard_scale_pct, ca.edges_rusted_pct, false)) FILTER (WHERE ca.id IS NOT NULL),
         max(tw_coating_area_rank(ca.breakdown_pct, ca.rusted_pct, ca.hard_scale_pct, ca.edges_rusted_pct, true)) FILTER (WHERE ca.id IS NOT NULL),
         now()
  FROM (SELECT 1) one LEFT JOIN coating_areas ca ON ca.inspection_id = latest.id
  ON CONFLICT (tank_id) DO UPDATE SET
    org_id = excluded.org_id, vessel_id = excluded.vessel_id, inspection_id = excluded.inspection_id,
    inspected_on = excluded.inspected_on, revision = excluded.revision,
    rank_table = excluded.rank_table, rank_wording = excluded.rank_wording, updated_at = excluded.updated_at;
END
$$;
--> statement-breakpoint
CREATE FUNCTION tw_inspections_tank_latest() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP IN ('UPDATE', 'DELETE') AND OLD.status = 'countersigned' THEN
    PERFORM tw_refresh_tank_latest(OLD.tank_id);
  END IF;
  IF TG_OP IN ('INSERT', 'UPDATE') AND NEW.status = 'countersigned'
     AND NOT (TG_OP = 'UPDATE' AND OLD.status = 'countersigned' AND OLD.tank_id = NEW.tank_id) THEN
    PERFORM tw_refresh_tank_latest(NEW.tank_id);
  END IF;
  RETURN NULL;
END
$$;
--> statement-breakpoint
CREATE TRIGGER inspections_tank_latest
AFTER INSERT OR DELETE OR UPDATE OF status, tank_id, inspected_on, revision ON inspections
FOR EACH ROW EXECUTE FUNCTION tw_inspections_tank_latest();
--> statement-breakpoint
-- Statement triggers with transition tables: a seed that writes thousands of
-- coating areas refreshes each countersigned tank once per statement.
CREATE FUNCTION tw_coating_areas_tank_latest() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  changed uuid[];
  tank uuid;
BEGIN
  IF TG_OP = 'INSERT' THEN
    SELECT array_agg(DISTINCT inspection_id) INTO changed FROM new_rows;
  ELSIF TG_OP = 'DELETE' THEN
    SELECT array_agg(DISTINCT inspection_id) INTO changed FROM old_rows;
  ELSE
    SELECT array_agg(DISTINCT x) INTO changed FROM (SELECT inspection_id AS x FROM new_rows UNION SELECT inspection_id FROM old_rows) u;
  END IF;
  FOR tank IN
    SELECT DISTINCT i.tank_id FROM inspections i WHERE i.id = ANY (changed) AND i.status = 'countersigned'
  LOOP
    PERFORM tw_refresh_tank_latest(tank);
  END LOOP;
  RETURN NULL;
END
$$;
--> statement-breakpoint
CREATE TRIGGER coating_areas_tank_latest_insert AFTER INSERT ON coating_areas
REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION tw_coating_areas_tank_latest();
--> statement-breakpoint
CREATE TRIGGER coating_areas_tank_latest_update AFTER UPDATE ON coating_areas
REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION tw_coating_areas_tank_latest();
--> statement-breakpoint
CREATE TRIGGER coating_areas_tank_latest_delete AFTER DELETE ON coating_areas
REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION tw_coating_areas_tank_latest();
--> statement-breakpoint
-- Existing databases: every tank with a countersigned inspection.
SELECT tw_refresh_tank_latest(t.tank_id) FROM (SELECT DISTINCT tank_id FROM inspections WHERE status = 'countersigned') t;

-- Names made twice by a race before this index existed are kept, renamed "(2)", "(3)"… so the index can be built.
UPDATE "components" AS c SET "name" = c."name" || ' (' || d.rn || ')'
FROM (SELECT "id", row_number() OVER (PARTITION BY "organisation_id", lower("name") ORDER BY "created_at", "id") AS rn FROM "components") AS d
WHERE c."id" = d."id" AND d.rn > 1;--> statement-breakpoint
CREATE UNIQUE INDEX "components_organisation_name_idx" ON "components" USING btree ("organisation_id",lower("name"));

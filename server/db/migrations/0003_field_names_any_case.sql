DROP INDEX "fields_farm_name_idx";--> statement-breakpoint
CREATE UNIQUE INDEX "fields_farm_name_idx" ON "fields" USING btree ("farm_id",lower("name"));
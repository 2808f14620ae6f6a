-- Oven atmosphere as the steam share by volume (0 = dry, kitchen air about 1.6 %, 100 = pure steam),
-- and a radiant grill by its kind and the heat flux at the food or the element's distance.
-- Portable SQL: runs unchanged on H2 2.x and PostgreSQL 10 or later.
--
-- Round one saved a "humidity %" that the engine read as relative humidity at the oven temperature,
-- which made a "dry fan, 10 %" oven pure steam. The values were a cook's reading of a combi oven's
-- humidity scale, which runs from hot air with the vent open (0 %) to full steam (100 %). The rule,
-- the same one the API applies to the old relativeHumidityPct field:
--   reading <= 10 %  -> 1.6 % steam (dry kitchen air: the vented range, no steam added)
--   reading  > 10 %  -> 1.6 + (reading - 10) * 98.4 / 90 % steam (linear up to 100 % steam at 100)
-- so 10 % stays dry, 30 % becomes 23.5 %, 80 % becomes 78.1 % and 100 % stays pure steam.
-- The old column is kept as it was, so the setup page can say what changed; a save through the form
-- clears it. Setups of other modes are not touched (their humidity was null).
ALTER TABLE heat_setup ADD COLUMN steam_pct DOUBLE PRECISION;

UPDATE heat_setup
SET steam_pct = CASE
        WHEN relative_humidity_pct IS NULL THEN 1.6
        WHEN relative_humidity_pct <= 10 THEN 1.6
        WHEN relative_humidity_pct >= 100 THEN 100
        ELSE 1.6 + (relative_humidity_pct - 10) * 98.4 / 90
    END
WHERE mode = 'oven';

-- Grills of round one were an element temperature under a salamander: kind salamander, usual distance.
ALTER TABLE heat_setup ADD COLUMN grill_kind VARCHAR(16);
ALTER TABLE heat_setup ADD COLUMN heat_flux_kw_per_m2 DOUBLE PRECISION;
ALTER TABLE heat_setup ADD COLUMN distance_mm DOUBLE PRECISION;

UPDATE heat_setup SET grill_kind = 'salamander' WHERE mode = 'grill';

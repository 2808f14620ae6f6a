-- What the saved-plans list shows beside the time: the core temperature at the target, the whole
-- portion's acrylamide estimate and its zone against the benchmark (low, elevated, high; empty where
-- no benchmark applies or acrylamide does not matter). Plans saved before have none until re-run.
ALTER TABLE saved_plan ADD COLUMN core_at_target_c DOUBLE PRECISION;
ALTER TABLE saved_plan ADD COLUMN portion_acrylamide_ug_per_kg DOUBLE PRECISION;
ALTER TABLE saved_plan ADD COLUMN acrylamide_zone VARCHAR(16);
-- What was done to a surface before cooking (soaked, blanched; empty for nothing): the changes that
-- lower acrylamide no longer offer it again.
ALTER TABLE surface ADD COLUMN pretreatment VARCHAR(16);

-- Pans and fryers get a body: a pan's material, mass, diameter, heat input, control and the share the
-- food covers; a fryer's oil, heater and food per batch. The columns are nullable: ovens and grills
-- have none. Existing pan and fryer setups get the defaults for a typical line pan or fryer
-- (PanBody.DEFAULT and FryerBody.DEFAULT in the engine): a 2.3 kg, 28 cm cast-iron pan with 2.5 kW
-- kept up by its burner, half covered by the food; 8 L of oil, a 3.2 kW heater, 0.5 kg per batch.
-- Plans from these setups now show the pan or oil drawn down by the load; before, it held its set
-- temperature whatever went in. Plain ALTER TABLE and UPDATE, for H2 and PostgreSQL alike.
ALTER TABLE heat_setup ADD COLUMN pan_material VARCHAR(40);
ALTER TABLE heat_setup ADD COLUMN pan_mass_kg DOUBLE PRECISION;
ALTER TABLE heat_setup ADD COLUMN pan_diameter_cm DOUBLE PRECISION;
ALTER TABLE heat_setup ADD COLUMN pan_power_kw DOUBLE PRECISION;
ALTER TABLE heat_setup ADD COLUMN pan_control VARCHAR(40);
ALTER TABLE heat_setup ADD COLUMN pan_cover_pct DOUBLE PRECISION;
ALTER TABLE heat_setup ADD COLUMN fryer_oil_litres DOUBLE PRECISION;
ALTER TABLE heat_setup ADD COLUMN fryer_heater_kw DOUBLE PRECISION;
ALTER TABLE heat_setup ADD COLUMN fryer_load_kg DOUBLE PRECISION;

UPDATE heat_setup
SET pan_material = 'cast-iron', pan_mass_kg = 2.3, pan_diameter_cm = 28, pan_power_kw = 2.5,
    pan_control = 'thermostat', pan_cover_pct = 50
WHERE mode = 'pan';

UPDATE heat_setup
SET fryer_oil_litres = 8, fryer_heater_kw = 3.2, fryer_load_kg = 0.5
WHERE mode = 'fryer';

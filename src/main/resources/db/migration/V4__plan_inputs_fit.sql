-- A saved plan's inputs are JSON of the surface and setup forms. Escaping can make a text six times
-- longer (a control character becomes \u00XX, RFC 8259 section 7), so size the column for the worst
-- case of every text field: names 80 + 80 and notes 1000 + 1000 characters at six each is 13 000,
-- plus under 2 000 for the field names and numbers. Portable: SET DATA TYPE is SQL standard and runs
-- on H2 2.x and PostgreSQL.
ALTER TABLE saved_plan ALTER COLUMN inputs_json SET DATA TYPE VARCHAR(20000);

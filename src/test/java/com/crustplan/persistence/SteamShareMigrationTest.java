package com.crustplan.persistence;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.LinkedHashMap;
import java.util.Map;

import org.flywaydb.core.Flyway;
import org.flywaydb.core.api.MigrationVersion;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import com.crustplan.engine.heat.Oven;
import com.crustplan.setup.HeatSettings;

/**
 * Migration V7 on a copy of a round-one database: Flyway up to V3 on a fresh database (H2
 * in memory, or a schema of its own on PostgreSQL when {@code CRUSTPLAN_TEST_PG_URL} is
 * set), round-one setups put in with their "humidity %", then migrated to the latest
 * version. Each oven keeps its intent: a dry fan stays near kitchen air, a steam oven
 * stays steam. Dew points checked against the steam tables (IAPWS-IF97 saturation: 1.58
 * kPa ↔ 13.8 °C, 101.3 kPa ↔ 100 °C).
 */
class SteamShareMigrationTest {

	private String url;

	private String user;

	private String password;

	private String schema;

	@BeforeEach
	void freshDatabase() {
		if (TestDatabase.postgres()) {
			Map<String, Object> p = TestDatabase.properties("migration");
			url = (String) p.get("spring.datasource.url");
			user = (String) p.get("spring.datasource.username");
			password = (String) p.get("spring.datasource.password");
			schema = "migration_v5_" + System.nanoTime();
		}
		else {
			url = "jdbc:h2:mem:migration-v5-" + System.nanoTime() + ";DB_CLOSE_DELAY=-1";
			user = "sa";
			password = "";
			schema = null;
		}
	}

	@AfterEach
	void dropSchema() throws SQLException {
		if (schema != null) {
			try (Connection c = DriverManager.getConnection(url, user, password); Statement s = c.createStatement()) {
				s.execute("DROP SCHEMA " + schema + " CASCADE");
			}
		}
		else {
			try (Connection c = DriverManager.getConnection(url, user, password); Statement s = c.createStatement()) {
				s.execute("SHUTDOWN");
			}
		}
	}

	private Flyway flyway(String target) {
		var config = Flyway.configure().dataSource(url, user, password).locations("classpath:db/migration");
		if (schema != null) {
			config = config.schemas(schema).createSchemas(true);
		}
		if (target != null) {
			config = config.target(MigrationVersion.fromVersion(target));
		}
		return config.load();
	}

	private Connection connect() throws SQLException {
		Connection c = DriverManager.getConnection(url, user, password);
		if (schema != null) {
			try (Statement s = c.createStatement()) {
				s.execute("SET search_path TO " + schema);
			}
		}
		return c;
	}

	private static void roundOneSetup(Connection c, String name, String mode, double temperatureC, boolean fan,
			Double humidityPct, Double flip) throws SQLException {
		try (PreparedStatement p = c
			.prepareStatement("INSERT INTO heat_setup (version, name, mode, temperature_c, fan, "
					+ "fat_film, relative_humidity_pct, flip_every_seconds, notes, created_at, updated_at) "
					+ "VALUES (0, ?, ?, ?, ?, FALSE, ?, ?, NULL, CURRENT_TIMESTAMP, CURRENT_TIMESTAMP)")) {
			p.setString(1, name);
			p.setString(2, mode);
			p.setDouble(3, temperatureC);
			p.setBoolean(4, fan);
			p.setObject(5, humidityPct);
			p.setObject(6, flip);
			p.executeUpdate();
		}
	}

	record Row(String mode, Double steamPct, Double oldHumidityPct, String grill, Double flux, Double distance) {
	}

	@Test
	void shouldKeepEachOvensIntentWhenMovingToTheSteamShare() throws SQLException {
		flyway("3").migrate();
		try (Connection c = connect()) {
			// the demo kitchen of round one, and the ends of the scale
			roundOneSetup(c, "Combi oven, dry fan", "oven", 200, true, 10.0, null);
			roundOneSetup(c, "Deck oven, bread", "oven", 230, false, 30.0, null);
			roundOneSetup(c, "Oven, vent open", "oven", 180, true, 0.0, null);
			roundOneSetup(c, "Combi, moist roast", "oven", 160, true, 80.0, null);
			roundOneSetup(c, "Steam oven", "oven", 100, true, 100.0, null);
			roundOneSetup(c, "Plancha", "pan", 230, false, null, 60.0);
			roundOneSetup(c, "Salamander", "grill", 800, false, null, 0.0);
		}
		flyway(null).migrate();
		Map<String, Row> rows = new LinkedHashMap<>();
		try (Connection c = connect();
				Statement s = c.createStatement();
				ResultSet r = s.executeQuery("SELECT name, mode, steam_pct, relative_humidity_pct, grill_kind, "
						+ "heat_flux_kw_per_m2, distance_mm FROM heat_setup")) {
			while (r.next()) {
				rows.put(r.getString(1),
						new Row(r.getString(2), (Double) r.getObject(3, Double.class),
								(Double) r.getObject(4, Double.class), r.getString(5),
								(Double) r.getObject(6, Double.class), (Double) r.getObject(7, Double.class)));
			}
		}
		assertThat(rows).hasSize(7);
		// a dry fan stays dry: kitchen air, 1.6 % steam, dew point about 14 °C
		assertThat(rows.get("Combi oven, dry fan").steamPct()).isCloseTo(1.6, within(1e-9));
		assertThat(rows.get("Oven, vent open").steamPct()).isCloseTo(1.6, within(1e-9));
		assertThat(new Oven(200, true, rows.get("Combi oven, dry fan").steamPct()).dewPointC()).isCloseTo(13.8,
				within(0.5));
		// above the dry range the share rises linearly: 30 → 1.6 + 20·98.4/90 = 23.47 %,
		// 80 → 78.13 %
		assertThat(rows.get("Deck oven, bread").steamPct()).isCloseTo(23.47, within(0.01));
		assertThat(rows.get("Combi, moist roast").steamPct()).isCloseTo(78.13, within(0.01));
		// a steam oven stays steam: 100 %, dew point 100 °C (101.325 kPa)
		assertThat(rows.get("Steam oven").steamPct()).isCloseTo(100, within(1e-9));
		assertThat(new Oven(100, true, rows.get("Steam oven").steamPct()).dewPointC()).isCloseTo(100, within(0.1));
		// the SQL and the API's reading of the old field agree
		for (String oven : new String[] { "Combi oven, dry fan", "Deck oven, bread", "Oven, vent open",
				"Combi, moist roast", "Steam oven" }) {
			Row row = rows.get(oven);
			assertThat(row.steamPct()).as(oven)
				.isCloseTo(HeatSettings.steamPctFromLegacyHumidity(row.oldHumidityPct()), within(1e-9));
		}
		// the old reading is kept as saved, so nothing is lost and the page can say what
		// changed
		assertThat(rows.get("Deck oven, bread").oldHumidityPct()).isEqualTo(30.0);
		// other modes untouched; round one's grill is a salamander at its usual distance
		assertThat(rows.get("Plancha").steamPct()).isNull();
		assertThat(rows.get("Salamander").grill()).isEqualTo("salamander");
		assertThat(rows.get("Salamander").flux()).isNull();
		assertThat(rows.get("Salamander").distance()).isNull();
	}

}

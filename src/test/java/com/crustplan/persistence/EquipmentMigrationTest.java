package com.crustplan.persistence;

import static org.assertj.core.api.Assertions.assertThat;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;

import org.flywaydb.core.Flyway;
import org.junit.jupiter.api.Test;

import com.crustplan.engine.heat.FryerBody;
import com.crustplan.engine.heat.PanBody;
import com.crustplan.setup.EquipmentSettings;

/**
 * V8 on a database saved before it (H2): existing pans and fryers get the engine's
 * defaults, exactly {@link PanBody#DEFAULT} and {@link FryerBody#DEFAULT}; ovens and
 * grills get no body.
 */
class EquipmentMigrationTest {

	static final String URL = "jdbc:h2:mem:equipment-migration;DB_CLOSE_DELAY=-1";

	@Test
	void shouldGiveExistingPansAndFryersTheDefaultBodies() throws SQLException {
		Flyway.configure().dataSource(URL, "sa", "").locations("classpath:db/migration").target("6").load().migrate();
		try (Connection c = DriverManager.getConnection(URL, "sa", ""); Statement s = c.createStatement()) {
			for (String[] row : new String[][] { { "Old plancha", "pan" }, { "Old fryer", "fryer" },
					{ "Old oven", "oven" } }) {
				s.executeUpdate(
						"INSERT INTO heat_setup (version, name, mode, temperature_c, fan, fat_film, created_at, "
								+ "updated_at) VALUES (0, '" + row[0] + "', '" + row[1]
								+ "', 180, FALSE, FALSE, CURRENT_TIMESTAMP, CURRENT_TIMESTAMP)");
			}
		}
		Flyway.configure().dataSource(URL, "sa", "").locations("classpath:db/migration").load().migrate();
		try (Connection c = DriverManager.getConnection(URL, "sa", ""); Statement s = c.createStatement()) {
			PanBody p = PanBody.DEFAULT;
			try (ResultSet r = s.executeQuery("SELECT pan_material, pan_mass_kg, pan_diameter_cm, pan_power_kw, "
					+ "pan_control, pan_cover_pct, fryer_oil_litres FROM heat_setup WHERE name = 'Old plancha'")) {
				assertThat(r.next()).isTrue();
				assertThat(r.getString(1)).isEqualTo(p.material().key());
				assertThat(r.getDouble(2)).isEqualTo(p.massKg());
				assertThat(r.getDouble(3)).isEqualTo(p.diameterCm());
				assertThat(r.getDouble(4)).isEqualTo(p.powerKw());
				assertThat(r.getString(5)).isEqualTo(EquipmentSettings.DEFAULT_CONTROL);
				assertThat(r.getDouble(6)).isEqualTo(p.coverPct());
				assertThat(r.getObject(7)).isNull();
			}
			FryerBody f = FryerBody.DEFAULT;
			try (ResultSet r = s.executeQuery("SELECT fryer_oil_litres, fryer_heater_kw, fryer_load_kg, pan_mass_kg "
					+ "FROM heat_setup WHERE name = 'Old fryer'")) {
				assertThat(r.next()).isTrue();
				assertThat(r.getDouble(1)).isEqualTo(f.oilLitres());
				assertThat(r.getDouble(2)).isEqualTo(f.heaterKw());
				assertThat(r.getDouble(3)).isEqualTo(f.loadKg());
				assertThat(r.getObject(4)).isNull();
			}
			try (ResultSet r = s
				.executeQuery("SELECT pan_mass_kg, fryer_oil_litres FROM heat_setup WHERE name = 'Old oven'")) {
				assertThat(r.next()).isTrue();
				assertThat(r.getObject(1)).isNull();
				assertThat(r.getObject(2)).isNull();
			}
		}
	}

}

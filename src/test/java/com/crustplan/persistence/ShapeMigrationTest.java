package com.crustplan.persistence;

import static org.assertj.core.api.Assertions.assertThat;

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

import com.crustplan.engine.food.Shape;

/**
 * Migration V9 on a database saved before shapes existed (Flyway up to V8 on a fresh
 * database: H2 in memory, or a schema of its own on PostgreSQL when
 * {@code CRUSTPLAN_TEST_PG_URL} is set). French fries become strips, the product's usual
 * shape; every other surface stays the slab it was planned as, roast potatoes included,
 * since that product also names rösti, a flat cake. Sizes are kept as saved.
 */
class ShapeMigrationTest {

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
			schema = "migration_v9_" + System.nanoTime();
		}
		else {
			url = "jdbc:h2:mem:migration-v9-" + System.nanoTime() + ";DB_CLOSE_DELAY=-1";
			user = "sa";
			password = "";
			schema = null;
		}
	}

	@AfterEach
	void dropSchema() throws SQLException {
		try (Connection c = DriverManager.getConnection(url, user, password); Statement s = c.createStatement()) {
			s.execute(schema != null ? "DROP SCHEMA " + schema + " CASCADE" : "SHUTDOWN");
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

	private static void savedSurface(Connection c, String name, String category, String product, double sizeMm)
			throws SQLException {
		try (PreparedStatement p = c.prepareStatement("INSERT INTO surface (version, name, category, product, "
				+ "water_pct, protein_pct, fat_pct, reducing_sugar_pct, sucrose_pct, starch_pct, fibre_pct, ash_pct, "
				+ "asparagine_mg_per_kg, surface_water_g_per_m2, thickness_mm, ph, bicarbonate_g_per_kg, "
				+ "acid_g_per_kg, initial_temperature_c, notes, created_at, updated_at) VALUES (0, ?, ?, ?, "
				+ "79, 2, 0.1, 0.4, 0.2, 15.5, 1.8, 1, 3000, 20, ?, NULL, 0, 0, 5, NULL, CURRENT_TIMESTAMP, "
				+ "CURRENT_TIMESTAMP)")) {
			p.setString(1, name);
			p.setString(2, category);
			p.setString(3, product);
			p.setDouble(4, sizeMm);
			p.executeUpdate();
		}
	}

	@Test
	void shouldMakeFrenchFriesStripsAndKeepEverythingElseASlab() throws SQLException {
		flyway("8").migrate();
		try (Connection c = connect()) {
			savedSurface(c, "Chips", "potato", "french-fries", 10);
			savedSurface(c, "Potato, usual product", "potato", null, 12);
			savedSurface(c, "Rösti", "potato", "roast-potato", 15);
			savedSurface(c, "Crisps", "potato", "crisps", 1.5);
			savedSurface(c, "Steak", "meat", null, 25);
			savedSurface(c, "Loaf", "bread", "wheat-bread", 80);
		}
		flyway(null).migrate();
		Map<String, String> shapes = new LinkedHashMap<>();
		Map<String, Double> sizes = new LinkedHashMap<>();
		try (Connection c = connect();
				Statement s = c.createStatement();
				ResultSet r = s.executeQuery("SELECT name, shape, thickness_mm FROM surface")) {
			while (r.next()) {
				shapes.put(r.getString(1), r.getString(2));
				sizes.put(r.getString(1), r.getDouble(3));
			}
		}
		assertThat(shapes).containsEntry("Chips", "strip")
			.containsEntry("Potato, usual product", "strip")
			.containsEntry("Rösti", "slab")
			.containsEntry("Crisps", "slab")
			.containsEntry("Steak", "slab")
			.containsEntry("Loaf", "slab");
		assertThat(shapes.values()).allSatisfy(k -> assertThat(Shape.byKey(k)).isPresent());
		assertThat(sizes).containsEntry("Chips", 10.0).containsEntry("Loaf", 80.0);
		// a surface saved after the migration without naming a shape is a slab
		try (Connection c = connect()) {
			savedSurface(c, "Later", "fish", null, 20);
			try (Statement s = c.createStatement();
					ResultSet r = s.executeQuery("SELECT shape FROM surface WHERE name = 'Later'")) {
				assertThat(r.next()).isTrue();
				assertThat(r.getString(1)).isEqualTo("slab");
			}
		}
	}

}

package com.crustplan.system;

import java.util.Locale;
import java.sql.DatabaseMetaData;

import javax.sql.DataSource;

import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.springframework.jdbc.support.JdbcUtils;
import org.springframework.jdbc.support.MetaDataAccessException;
import org.springframework.session.config.SessionRepositoryCustomizer;
import org.springframework.session.jdbc.JdbcIndexedSessionRepository;
import org.springframework.session.jdbc.PostgreSqlJdbcIndexedSessionRepositoryCustomizer;

/**
 * Sessions in the database (Spring Session JDBC) so instances share sign-ins. Two
 * requests of one session can add the same attribute at once (a flash message from each
 * of two quick saves); a plain INSERT then fails on the key, so attributes are written as
 * an upsert in each database's dialect.
 */
@Configuration
class SessionConfig {

	/** H2's MERGE ... KEY is its upsert (H2 documentation, MERGE statement). */
	static final String H2_UPSERT = "MERGE INTO %TABLE_NAME%_ATTRIBUTES (SESSION_PRIMARY_ID, ATTRIBUTE_NAME, ATTRIBUTE_BYTES) "
			+ "KEY (SESSION_PRIMARY_ID, ATTRIBUTE_NAME) VALUES (?, ?, ?)";

	@Bean
	SessionRepositoryCustomizer<JdbcIndexedSessionRepository> sessionAttributeUpsert(DataSource dataSource)
			throws MetaDataAccessException {
		String product = JdbcUtils.extractDatabaseMetaData(dataSource, DatabaseMetaData::getDatabaseProductName);
		if (product != null && product.toLowerCase(Locale.ROOT).contains("postgres")) {
			return new PostgreSqlJdbcIndexedSessionRepositoryCustomizer();
		}
		if ("H2".equalsIgnoreCase(product)) {
			return repository -> repository.setCreateSessionAttributeQuery(H2_UPSERT);
		}
		return repository -> {
		};
	}

}

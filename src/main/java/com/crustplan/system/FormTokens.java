package com.crustplan.system;

import java.sql.Timestamp;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import java.util.UUID;
import java.util.function.Supplier;
import java.util.regex.Pattern;

import org.springframework.dao.DataAccessException;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Service;
import org.springframework.transaction.PlatformTransactionManager;
import org.springframework.transaction.support.TransactionTemplate;

/**
 * One-time tokens for page forms that create a record. A form carries a fresh token; the
 * save and the token's row (table {@code form_submission}, primary key on the token)
 * commit in one transaction, so of two submits of the same form only one can commit: the
 * other's insert fails on the key and its save rolls back, and both answers lead to the
 * one record. Works across instances and survives a restart because it lives in the
 * database, not in memory or the session.
 */
@Service
public class FormTokens {

	/**
	 * Kept for a day: longer than any form stays open in a kitchen (common practice for
	 * idempotency keys).
	 */
	static final Duration KEEP = Duration.ofDays(1);

	private static final Pattern TOKEN = Pattern
		.compile("[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}");

	private final JdbcTemplate jdbc;

	private final TransactionTemplate tx;

	FormTokens(JdbcTemplate jdbc, PlatformTransactionManager transactions) {
		this.jdbc = jdbc;
		this.tx = new TransactionTemplate(transactions);
	}

	/**
	 * The result of a submit: the record's id, and whether an earlier submit of the same
	 * form made it.
	 */
	public record Submitted(long id, boolean repeat) {
	}

	/** A fresh token for a new form. */
	public static String issue() {
		return UUID.randomUUID().toString();
	}

	/**
	 * The token to show again in a re-rendered form: the one it carried if well formed,
	 * else a fresh one.
	 */
	public static String keep(String token) {
		return valid(token) ? token : issue();
	}

	static boolean valid(String token) {
		return token != null && TOKEN.matcher(token).matches();
	}

	/**
	 * Runs {@code save} (returning the new record's id) at most once per token. Without a
	 * well-formed token (an API client, an old page) it simply saves.
	 */
	public Submitted once(String kind, String token, Supplier<Long> save) {
		if (!valid(token)) {
			return new Submitted(save.get(), false);
		}
		Optional<Long> earlier = earlier(kind, token);
		if (earlier.isPresent()) {
			return new Submitted(earlier.get(), true);
		}
		try {
			Long id = tx.execute(status -> {
				long saved = save.get();
				jdbc.update("INSERT INTO form_submission (token, kind, record_id, created_at) VALUES (?, ?, ?, ?)",
						token, kind, saved, Timestamp.from(Instant.now()));
				return saved;
			});
			purge();
			return new Submitted(id, false);
		}
		catch (DataAccessException e) {
			// the same form committed first (duplicate key, or its lock held until it
			// did): lead to its record
			return earlier(kind, token).map(id -> new Submitted(id, true)).orElseThrow(() -> e);
		}
	}

	/** Old tokens go; a failure here never undoes the save that has committed. */
	private void purge() {
		try {
			jdbc.update("DELETE FROM form_submission WHERE created_at < ?", Timestamp.from(Instant.now().minus(KEEP)));
		}
		catch (DataAccessException e) {
			// tried again after the next save
		}
	}

	private Optional<Long> earlier(String kind, String token) {
		List<Long> ids = jdbc.queryForList("SELECT record_id FROM form_submission WHERE token = ? AND kind = ?",
				Long.class, token, kind);
		return ids.stream().findFirst();
	}

}

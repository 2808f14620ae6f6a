package com.crustplan.system;

import java.nio.charset.StandardCharsets;
import java.security.GeneralSecurityException;
import java.security.SecureRandom;
import java.time.Duration;
import java.util.Base64;

import javax.crypto.Mac;
import javax.crypto.spec.SecretKeySpec;

import com.github.benmanes.caffeine.cache.Cache;
import com.github.benmanes.caffeine.cache.Caffeine;
import com.github.benmanes.caffeine.cache.Ticker;

import org.springframework.security.crypto.password.PasswordEncoder;

/**
 * Remembers, for a few minutes, that a presented password matched a stored BCrypt hash,
 * so an API client sending HTTP Basic on every request pays the deliberately slow hash
 * once, not on every request. Only the password check is remembered: the account is still
 * read from the database on every request, so a disabled account or a changed role counts
 * at once, and a new password has a new hash (a new salt), which no remembered entry
 * matches.
 * <p>
 * The key is the stored hash plus an HMAC-SHA256 of the presented password under a key
 * drawn at start and never stored; only successful checks are kept, so a wrong guess
 * always costs the full hash (and is counted by {@link SignInThrottle}).
 * <p>
 * The trade-off: while an entry lives, the process memory holds a fast (SHA-256) digest
 * of a password where otherwise only the slow hash would be. Someone who can read this
 * process's memory (a heap dump) could test guesses against it far faster than against
 * BCrypt. The random key stops precomputed tables, the short life and the size bound
 * limit how many digests exist at any time, and heap dumps of a server must be guarded as
 * secrets anyway.
 */
public class CredentialCheckCache {

	/**
	 * How long a successful check is remembered: an API client then pays one BCrypt check
	 * per five minutes instead of one per request (common practice for credential caches:
	 * minutes, not hours).
	 */
	static final Duration REMEMBER = Duration.ofMinutes(5);

	/**
	 * Entries kept at most: far above a kitchen's accounts × clients, about 1 MB
	 * (calibrated to stay small).
	 */
	static final int MAX_ENTRIES = 10_000;

	/**
	 * 256-bit HMAC key, the size of the SHA-256 output (RFC 2104 §3 recommends at least
	 * that).
	 */
	private static final int KEY_BYTES = 32;

	private record Key(String storedHash, String digest) {
	}

	private final PasswordEncoder delegate;

	private final Cache<Key, Boolean> matched;

	private final ThreadLocal<Mac> mac;

	public CredentialCheckCache(PasswordEncoder delegate, Ticker ticker) {
		this.delegate = delegate;
		this.matched = Caffeine.newBuilder().maximumSize(MAX_ENTRIES).expireAfterWrite(REMEMBER).ticker(ticker).build();
		byte[] key = new byte[KEY_BYTES];
		new SecureRandom().nextBytes(key);
		SecretKeySpec spec = new SecretKeySpec(key, "HmacSHA256");
		this.mac = ThreadLocal.withInitial(() -> {
			try {
				Mac m = Mac.getInstance("HmacSHA256");
				m.init(spec);
				return m;
			}
			catch (GeneralSecurityException e) {
				// every Java platform must provide HmacSHA256 (java.security.Mac
				// documentation)
				throw new IllegalStateException(e);
			}
		});
	}

	/**
	 * The password encoder for the sign-in check: encodes as the delegate does, matches
	 * through this cache. Not a bean itself, so everything else keeps the plain encoder.
	 */
	public PasswordEncoder encoder() {
		return new PasswordEncoder() {
			@Override
			public String encode(CharSequence rawPassword) {
				return delegate.encode(rawPassword);
			}

			@Override
			public boolean matches(CharSequence rawPassword, String encodedPassword) {
				return CredentialCheckCache.this.matches(rawPassword, encodedPassword);
			}

			@Override
			public boolean upgradeEncoding(String encodedPassword) {
				return delegate.upgradeEncoding(encodedPassword);
			}
		};
	}

	public boolean matches(CharSequence rawPassword, String encodedPassword) {
		if (rawPassword == null || encodedPassword == null || encodedPassword.isEmpty()) {
			return delegate.matches(rawPassword, encodedPassword);
		}
		Key key = new Key(encodedPassword, digest(rawPassword));
		if (matched.getIfPresent(key) != null) {
			return true;
		}
		boolean ok = delegate.matches(rawPassword, encodedPassword);
		if (ok) {
			matched.put(key, Boolean.TRUE);
		}
		return ok;
	}

	/**
	 * Drops what was remembered for an account's stored hash (its password, role or state
	 * changed).
	 */
	public void forget(String storedHash) {
		if (storedHash != null) {
			matched.asMap().keySet().removeIf(k -> k.storedHash().equals(storedHash));
		}
	}

	public void clear() {
		matched.invalidateAll();
	}

	private String digest(CharSequence raw) {
		byte[] d = mac.get().doFinal(raw.toString().getBytes(StandardCharsets.UTF_8));
		return Base64.getEncoder().withoutPadding().encodeToString(d);
	}

}

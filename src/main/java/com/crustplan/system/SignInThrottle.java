package com.crustplan.system;

import java.net.InetAddress;
import java.net.UnknownHostException;
import java.time.Duration;
import java.util.Arrays;
import java.util.Locale;

import com.github.benmanes.caffeine.cache.Cache;
import com.github.benmanes.caffeine.cache.Caffeine;
import com.github.benmanes.caffeine.cache.Ticker;

import org.springframework.security.core.AuthenticationException;

/**
 * Counts wrong passwords per account and per client address and refuses further sign-ins
 * for a cooling period once either count reaches its limit. A refused attempt costs a map
 * lookup, never a password hash, so a flood of guesses cannot take the processor from
 * other clients.
 * <p>
 * Both tallies are Caffeine caches with a size bound: a flood of made-up user names or
 * addresses cannot grow memory, and the frequency-aware eviction keeps the busy entries
 * (the account under attack, the attacking address) rather than the newest ones.
 * <p>
 * The trade-off of any lock-out: someone who knows a user name can lock that account for
 * a cooling period, and everyone behind one address (a kitchen's router) shares that
 * address's tally. The account limit is therefore low and the address limit higher;
 * neither stops a right password from being accepted once the cooling period is over.
 */
public class SignInThrottle {

	/** Why a sign-in was refused without looking at the password. */
	public static class Refused extends AuthenticationException {

		private final Duration retryAfter;

		Refused(Duration retryAfter) {
			super("too many wrong passwords for this account or from this address");
			this.retryAfter = retryAfter;
		}

		public Duration retryAfter() {
			return retryAfter;
		}

		/** Whole minutes to wait, at least one (what the person is told). */
		public long minutes() {
			return Math.max(1, (retryAfter.toSeconds() + 59) / 60);
		}

	}

	/**
	 * Failures since {@code first} (nanoseconds of the ticker); locked until
	 * {@code lockedUntil}.
	 */
	private record Tally(int failures, long first, long lockedUntil) {
	}

	/**
	 * Entries per tally: 10 000 accounts or addresses at about 200 bytes each is 2 MB
	 * (calibrated to stay small; a kitchen has tens of accounts, a flood is cut off by
	 * the address tally).
	 */
	static final int MAX_ENTRIES = 10_000;

	/** Longest account key kept: user names are at most 60 characters (UserForm). */
	private static final int MAX_KEY = 64;

	private final int accountLimit;

	private final int addressLimit;

	private final long coolingNanos;

	private final Ticker ticker;

	private final Cache<String, Tally> accounts;

	private final Cache<String, Tally> addresses;

	public SignInThrottle(int accountLimit, int addressLimit, Duration cooling, Ticker ticker) {
		if (accountLimit < 1 || addressLimit < 1 || cooling.isNegative() || cooling.isZero()) {
			throw new IllegalArgumentException("sign-in limits must be at least 1 and the cooling period positive");
		}
		this.accountLimit = accountLimit;
		this.addressLimit = addressLimit;
		this.coolingNanos = cooling.toNanos();
		this.ticker = ticker;
		// a tally lives through its counting window and the lock that may follow it;
		// evictions run on
		// the calling thread (a few map operations), so the bound holds without a pool
		// thread
		this.accounts = Caffeine.newBuilder()
			.maximumSize(MAX_ENTRIES)
			.expireAfterWrite(cooling.multipliedBy(2))
			.ticker(ticker)
			.executor(Runnable::run)
			.build();
		this.addresses = Caffeine.newBuilder()
			.maximumSize(MAX_ENTRIES)
			.expireAfterWrite(cooling.multipliedBy(2))
			.ticker(ticker)
			.executor(Runnable::run)
			.build();
	}

	public Duration cooling() {
		return Duration.ofNanos(coolingNanos);
	}

	/** Throws {@link Refused} when the account or the address is cooling off. */
	public void check(String account, String address) {
		long now = ticker.read();
		long until = Math.max(lockedUntil(accounts, accountKey(account), now),
				lockedUntil(addresses, addressKey(address), now));
		if (until > now) {
			throw new Refused(Duration.ofNanos(until - now));
		}
	}

	/** A wrong password (or an unknown user name) for this account from this address. */
	public void failed(String account, String address) {
		long now = ticker.read();
		count(accounts, accountKey(account), accountLimit, now);
		count(addresses, addressKey(address), addressLimit, now);
	}

	/**
	 * A right password clears the account's tally. The address keeps its tally, or one
	 * valid account would let its holder reset the count between guesses at other
	 * accounts.
	 */
	public void succeeded(String account) {
		String key = accountKey(account);
		if (key != null) {
			accounts.invalidate(key);
		}
	}

	/** Forgets every tally (tests, and an administrator's restart). */
	public void clear() {
		accounts.invalidateAll();
		addresses.invalidateAll();
	}

	/** Tallies held now (after pending evictions), for the size bound's test. */
	long size() {
		accounts.cleanUp();
		addresses.cleanUp();
		return accounts.estimatedSize() + addresses.estimatedSize();
	}

	private long lockedUntil(Cache<String, Tally> tallies, String key, long now) {
		Tally t = key == null ? null : tallies.getIfPresent(key);
		return t == null ? Long.MIN_VALUE : t.lockedUntil();
	}

	private void count(Cache<String, Tally> tallies, String key, int limit, long now) {
		if (key == null) {
			return;
		}
		tallies.asMap().compute(key, (k, t) -> {
			// a new window once the last one (and any lock in it) is over
			if (t == null || (now - t.first() > coolingNanos && t.lockedUntil() - now <= 0)) {
				t = new Tally(0, now, now);
			}
			int failures = t.failures() + 1;
			long lockedUntil = failures >= limit && t.lockedUntil() - now <= 0 ? now + coolingNanos : t.lockedUntil();
			return new Tally(failures, t.first(), lockedUntil);
		});
	}

	/**
	 * User names are looked up trimmed and ignoring case (AccountDetailsService), so
	 * counted that way.
	 */
	static String accountKey(String account) {
		if (account == null) {
			return null;
		}
		String k = account.trim().toLowerCase(Locale.ROOT);
		return k.length() > MAX_KEY ? k.substring(0, MAX_KEY) : k;
	}

	/**
	 * An IPv4 address as it is; an IPv6 address by its /64 network, since one subscriber
	 * is given at least a whole /64 (RFC 6177) and could otherwise change address between
	 * guesses.
	 */
	static String addressKey(String address) {
		if (address == null || address.isBlank()) {
			return null;
		}
		if (address.indexOf(':') < 0) {
			return address;
		}
		try {
			// in brackets the JDK takes it as an IPv6 literal only: parsed, never looked
			// up in DNS
			byte[] b = InetAddress.getByName("[" + address + "]").getAddress();
			return b.length == 16 ? "v6:" + Arrays.toString(Arrays.copyOf(b, 8)) : address;
		}
		catch (UnknownHostException e) {
			return address;
		}
	}

}

package com.crustplan.system;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatCode;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.Duration;
import java.util.concurrent.atomic.AtomicLong;

import org.junit.jupiter.api.Test;

/**
 * The throttle's counting on a hand-driven clock, so the cooling period passes without
 * waiting. Addresses are from the documentation ranges (RFC 5737 for IPv4, RFC 3849 for
 * IPv6).
 */
class SignInThrottleTest {

	final AtomicLong now = new AtomicLong(1_000_000_000L);

	final SignInThrottle throttle = new SignInThrottle(5, 20, Duration.ofMinutes(15), now::get);

	@Test
	void shouldRefuseAnAccountAfterFiveWrongPasswordsUntilTheCoolingPeriodIsOver() {
		for (int i = 0; i < 5; i++) {
			throttle.check("chef", "192.0.2.1");
			throttle.failed("chef", "192.0.2.1");
		}
		// the same account from anywhere, in any case or with spaces (as
		// AccountDetailsService looks it up)
		assertThatThrownBy(() -> throttle.check(" CHEF ", "198.51.100.9")).isInstanceOf(SignInThrottle.Refused.class)
			.satisfies(e -> assertThat(((SignInThrottle.Refused) e).minutes()).isEqualTo(15));
		assertThatCode(() -> throttle.check("cook", "198.51.100.9")).doesNotThrowAnyException();
		advance(Duration.ofMinutes(14));
		assertThatThrownBy(() -> throttle.check("chef", "198.51.100.9")).isInstanceOf(SignInThrottle.Refused.class)
			.satisfies(e -> assertThat(((SignInThrottle.Refused) e).minutes()).isEqualTo(1));
		advance(Duration.ofMinutes(1).plusSeconds(1));
		assertThatCode(() -> throttle.check("chef", "198.51.100.9")).doesNotThrowAnyException();
	}

	@Test
	void shouldRefuseAnAddressAfterTwentyWrongPasswordsForAnyAccounts() {
		for (int i = 0; i < 20; i++) {
			throttle.failed("guess-" + i, "203.0.113.7");
		}
		assertThatThrownBy(() -> throttle.check("chef", "203.0.113.7")).isInstanceOf(SignInThrottle.Refused.class);
		// other clients are not affected
		assertThatCode(() -> throttle.check("chef", "203.0.113.8")).doesNotThrowAnyException();
	}

	@Test
	void shouldForgiveTheAccountButNotTheAddressOnARightPassword() {
		for (int i = 0; i < 4; i++) {
			throttle.failed("chef", "192.0.2.1");
		}
		throttle.succeeded("chef");
		throttle.failed("chef", "192.0.2.1");
		assertThatCode(() -> throttle.check("chef", "192.0.2.2")).doesNotThrowAnyException();
		for (int i = 0; i < 15; i++) {
			throttle.failed("other-" + i, "192.0.2.1");
		}
		// 4 + 1 + 15 = 20 from the address, the right password in between notwithstanding
		assertThatThrownBy(() -> throttle.check("cook", "192.0.2.1")).isInstanceOf(SignInThrottle.Refused.class);
	}

	@Test
	void shouldStartANewCountOnceTheWindowHasPassedWithoutALock() {
		for (int i = 0; i < 4; i++) {
			throttle.failed("chef", "192.0.2.1");
		}
		advance(Duration.ofMinutes(16));
		throttle.failed("chef", "192.0.2.1");
		assertThatCode(() -> throttle.check("chef", "192.0.2.1")).doesNotThrowAnyException();
	}

	@Test
	void shouldCountAWholeIpv6SlashSixtyFourAsOneClient() {
		for (int i = 0; i < 20; i++) {
			throttle.failed("guess-" + i, "2001:db8:0:1::" + Integer.toHexString(i + 1));
		}
		assertThatThrownBy(() -> throttle.check("chef", "2001:db8:0:1:ffff::1"))
			.isInstanceOf(SignInThrottle.Refused.class);
		assertThatCode(() -> throttle.check("chef", "2001:db8:0:2::1")).doesNotThrowAnyException();
		assertThat(SignInThrottle.addressKey("2001:DB8:0:1:0:0:0:5"))
			.isEqualTo(SignInThrottle.addressKey("2001:db8:0:1::9"));
	}

	@Test
	void shouldStayBoundedUnderAFloodOfMadeUpNames() {
		for (int i = 0; i < 3 * SignInThrottle.MAX_ENTRIES; i++) {
			throttle.failed("made-up-" + i, "10.0." + (i >> 8 & 255) + "." + (i & 255));
		}
		assertThat(throttle.size()).isLessThanOrEqualTo(2L * SignInThrottle.MAX_ENTRIES);
		assertThatCode(() -> throttle.check("chef", "192.0.2.1")).doesNotThrowAnyException();
	}

	private void advance(Duration d) {
		now.addAndGet(d.toNanos());
	}

}

package com.crustplan.user;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.mockito.ArgumentMatchers.any;
import static org.mockito.Mockito.mock;
import static org.mockito.Mockito.never;
import static org.mockito.Mockito.verify;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.springframework.boot.builder.SpringApplicationBuilder;
import org.springframework.context.ConfigurableApplicationContext;
import org.springframework.security.crypto.bcrypt.BCryptPasswordEncoder;
import org.springframework.security.crypto.password.PasswordEncoder;

import com.crustplan.CrustplanApplication;

/**
 * On an empty database the first administrator comes from the configured name and
 * password.
 */
class FirstAdminTest {

	@Test
	void shouldCreateTheConfiguredFirstAdministratorOnceAndNoDemoAccounts() {
		String url = "jdbc:h2:file:"
				+ Path.of("target", "test-databases", "first-admin-" + System.nanoTime()).toAbsolutePath()
				+ ";WRITE_DELAY=0";
		String[] args = { "--spring.datasource.url=" + url, "--server.port=0", "--spring.main.banner-mode=off",
				"--logging.level.root=WARN", "--crustplan.admin.username=owner",
				"--crustplan.admin.password=first owner passphrase" };
		try (ConfigurableApplicationContext ctx = new SpringApplicationBuilder(CrustplanApplication.class).run(args)) {
			UserAccountRepository users = ctx.getBean(UserAccountRepository.class);
			UserAccount owner = users.findByUsernameIgnoreCase("owner").orElseThrow();
			assertThat(owner.getRole()).isEqualTo(Role.ADMIN);
			assertThat(ctx.getBean(PasswordEncoder.class).matches("first owner passphrase", owner.getPasswordHash()))
				.isTrue();
			// without the demo profile there are no demo accounts and no demo kitchen
			assertThat(users.findByUsernameIgnoreCase("chef")).isEmpty();
			assertThat(users.count()).isEqualTo(1);
		}
	}

	/**
	 * A configured password BCrypt cannot take whole (over 72 bytes): start-up stops and
	 * names the setting.
	 */
	@Test
	void shouldRefuseAConfiguredPasswordOverSeventyTwoBytes() {
		UserAccountRepository users = mock(UserAccountRepository.class);
		FirstAdmin first = new FirstAdmin(users, new BCryptPasswordEncoder(4), "owner", "\uD83C\uDF5F".repeat(20));
		assertThatThrownBy(() -> first.run(null)).isInstanceOf(IllegalStateException.class)
			.hasMessageContaining("crustplan.admin.password")
			.hasMessageContaining("at most 72 bytes");
		verify(users, never()).save(any());
	}

	@Test
	void shouldMakeRandomPasswordsLongAndDifferent() {
		String a = FirstAdmin.randomPassword();
		String b = FirstAdmin.randomPassword();
		assertThat(a).hasSize(FirstAdmin.RANDOM_LENGTH).isNotEqualTo(b);
	}

}

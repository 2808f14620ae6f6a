package com.crustplan.user;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.springframework.boot.builder.SpringApplicationBuilder;
import org.springframework.context.ConfigurableApplicationContext;
import org.springframework.security.crypto.password.PasswordEncoder;

import com.crustplan.CrustplanApplication;

/** On an empty database the first administrator comes from the configured name and password. */
class FirstAdminTest {

	@Test
	void shouldCreateTheConfiguredFirstAdministratorOnceAndNoDemoAccounts() {
		String url = "jdbc:h2:file:" + Path.of("target", "test-databases", "first-admin-" + System.nanoTime())
			.toAbsolutePath() + ";WRITE_DELAY=0";
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

	@Test
	void shouldMakeRandomPasswordsLongAndDifferent() {
		String a = FirstAdmin.randomPassword();
		String b = FirstAdmin.randomPassword();
		assertThat(a).hasSize(FirstAdmin.RANDOM_LENGTH).isNotEqualTo(b);
	}

}

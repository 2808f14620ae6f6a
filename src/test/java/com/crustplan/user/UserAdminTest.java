package com.crustplan.user;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.not;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.view;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.security.test.context.support.WithMockUser;
import org.springframework.test.web.servlet.MockMvc;

import com.crustplan.CrustplanTest;

@CrustplanTest
@WithMockUser(username = "admin", roles = "ADMIN")
class UserAdminTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	UserAccountRepository users;

	@Autowired
	PasswordEncoder encoder;

	@Test
	void shouldHaveCreatedAFirstAdministratorWithAHashedPassword() {
		UserAccount admin = users.findByUsernameIgnoreCase("admin").orElseThrow();
		assertThat(admin.getRole()).isEqualTo(Role.ADMIN);
		// a BCrypt hash: "$2a$10$" and 53 more characters (60 in all, per the BCrypt
		// format)
		assertThat(admin.getPasswordHash()).startsWith("$2a$10$").hasSize(60);
	}

	@Test
	void shouldListUsersForAnAdministratorOnly() throws Exception {
		mvc.perform(get("/admin/users"))
			.andExpect(status().isOk())
			.andExpect(view().name("user/list"))
			.andExpect(content().string(containsString("Chef")));
		mvc.perform(get("/admin/users").with(user("chef").roles("CHEF"))).andExpect(status().isForbidden());
		mvc.perform(get("/admin/users").with(user("cook").roles("COOK"))).andExpect(status().isForbidden());
	}

	@Test
	void shouldCreateAUserWithAHashedPasswordAndNeverShowIt() throws Exception {
		mvc.perform(post("/admin/users/new").with(csrf())
			.param("username", "sous")
			.param("role", "CHEF")
			.param("password", " a long kitchen passphrase ")
			.param("enabled", "true")).andExpect(status().is3xxRedirection()).andExpect(redirectedUrl("/admin/users"));
		UserAccount a = users.findByUsernameIgnoreCase("sous").orElseThrow();
		// taken exactly as typed, spaces included
		assertThat(encoder.matches(" a long kitchen passphrase ", a.getPasswordHash())).isTrue();
		mvc.perform(get("/admin/users/{id}/edit", a.getId()))
			.andExpect(status().isOk())
			.andExpect(content().string(not(containsString("a long kitchen passphrase"))))
			.andExpect(content().string(not(containsString(a.getPasswordHash()))));
	}

	@Test
	void shouldRefuseAShortPasswordATakenNameAndAnUnknownRole() throws Exception {
		mvc.perform(post("/admin/users/new").with(csrf())
			.param("username", "shorty")
			.param("role", "COOK")
			.param("password", "short"))
			.andExpect(status().isOk())
			.andExpect(model().attributeHasFieldErrors("form", "password"));
		mvc.perform(post("/admin/users/new").with(csrf())
			.param("username", "chef")
			.param("role", "COOK")
			.param("password", "long enough password")).andExpect(model().attributeHasFieldErrors("form", "username"));
		mvc.perform(post("/admin/users/new").with(csrf())
			.param("username", "x1")
			.param("role", "OWNER")
			.param("password", "long enough password")).andExpect(model().attributeHasFieldErrors("form", "role"));
		mvc.perform(post("/admin/users/new").with(csrf())
			.param("username", "<b>bad</b>")
			.param("role", "COOK")
			.param("password", "long enough password")).andExpect(model().attributeHasFieldErrors("form", "username"));
	}

	/**
	 * BCrypt takes at most 72 bytes (Blowfish's 18-word P-array); UTF-8 lengths per RFC
	 * 3629: an emoji outside the Basic Multilingual Plane is 4 bytes, so 20 of them are
	 * 80. Each refused with a message on the password field, on a new account and on an
	 * edit, never a 500.
	 */
	@Test
	void shouldRefusePasswordsOverSeventyTwoBytesWithAFieldMessage() throws Exception {
		String[] tooLong = { "k".repeat(73), "k".repeat(100), "\uD83C\uDF5F".repeat(20), "é".repeat(37) };
		for (String pw : tooLong) {
			mvc.perform(post("/admin/users/new").with(csrf())
				.param("username", "longpw")
				.param("role", "COOK")
				.param("password", pw))
				.andExpect(status().isOk())
				.andExpect(model().attributeHasFieldErrors("form", "password"))
				.andExpect(content().string(containsString("at most 72 bytes")));
		}
		assertThat(users.findByUsernameIgnoreCase("longpw")).isEmpty();
		UserAccount cook = users.findByUsernameIgnoreCase("cook").orElseThrow();
		String before = cook.getPasswordHash();
		mvc.perform(post("/admin/users/{id}/edit", cook.getId()).with(csrf())
			.param("username", "cook")
			.param("role", "COOK")
			.param("password", "\uD83C\uDF5F".repeat(20))
			.param("enabled", "true"))
			.andExpect(status().isOk())
			.andExpect(model().attributeHasFieldErrors("form", "password"));
		assertThat(users.findById(cook.getId()).orElseThrow().getPasswordHash()).isEqualTo(before);
		// exactly 72 bytes is fine: 18 emoji
		mvc.perform(post("/admin/users/new").with(csrf())
			.param("username", "emoji72")
			.param("role", "COOK")
			.param("password", "\uD83C\uDF5F".repeat(18))
			.param("enabled", "true")).andExpect(redirectedUrl("/admin/users"));
		assertThat(encoder.matches("\uD83C\uDF5F".repeat(18),
				users.findByUsernameIgnoreCase("emoji72").orElseThrow().getPasswordHash()))
			.isTrue();
	}

	@Test
	void shouldKeepTheLastAdministrator() throws Exception {
		UserAccount admin = users.findByUsernameIgnoreCase("admin").orElseThrow();
		long admins = users.findAll().stream().filter(u -> u.getRole() == Role.ADMIN && u.isEnabled()).count();
		if (admins == 1) {
			mvc.perform(post("/admin/users/{id}/edit", admin.getId()).with(csrf())
				.param("username", "admin")
				.param("role", "COOK")
				.param("password", "")
				.param("enabled", "true"))
				.andExpect(status().isOk())
				.andExpect(model().attributeHasFieldErrors("form", "role"));
		}
		assertThat(users.findById(admin.getId()).orElseThrow().getRole()).isEqualTo(Role.ADMIN);
	}

}

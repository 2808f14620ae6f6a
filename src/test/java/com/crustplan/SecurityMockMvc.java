package com.crustplan;

import static org.springframework.security.test.web.servlet.setup.SecurityMockMvcConfigurers.springSecurity;

import org.springframework.boot.test.context.TestConfiguration;
import org.springframework.boot.webmvc.test.autoconfigure.MockMvcBuilderCustomizer;
import org.springframework.context.annotation.Bean;

/**
 * MockMvc with Spring Security's test support, so @WithMockUser and user() reach the
 * filter chain.
 */
@TestConfiguration(proxyBeanMethods = false)
class SecurityMockMvc {

	@Bean
	MockMvcBuilderCustomizer springSecurityTestSupport() {
		return builder -> builder.apply(springSecurity());
	}

}

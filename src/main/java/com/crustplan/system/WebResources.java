package com.crustplan.system;

import java.time.Duration;

import org.springframework.context.annotation.Configuration;
import org.springframework.http.CacheControl;
import org.springframework.web.servlet.config.annotation.ResourceHandlerRegistry;
import org.springframework.web.servlet.config.annotation.WebMvcConfigurer;
import org.springframework.web.servlet.resource.LiteWebJarsResourceResolver;

/**
 * Static files and webjars under their own paths only
 * (spring.web.resources.add-mappings=false drops Boot's catch-all "/**" handler). With
 * the catch-all, every link a page writes (/plans/4, /surfaces …) was looked up as a
 * possible file inside the jar on every view, which cost more than the page itself under
 * load.
 */
@Configuration(proxyBeanMethods = false)
class WebResources implements WebMvcConfigurer {

	/**
	 * Browsers may keep the app's own CSS, script and images for an hour (they change
	 * with releases).
	 */
	private static final CacheControl OWN_FILES = CacheControl.maxAge(Duration.ofHours(1));

	@Override
	public void addResourceHandlers(ResourceHandlerRegistry registry) {
		for (String folder : new String[] { "css", "js", "images" }) {
			registry.addResourceHandler("/" + folder + "/**")
				.addResourceLocations("classpath:/static/" + folder + "/")
				.setCacheControl(OWN_FILES)
				.resourceChain(true);
		}
		// version-less webjar paths (/webjars/chart.js/dist/chart.umd.js) resolved to the
		// jar's version
		registry.addResourceHandler("/webjars/**")
			.addResourceLocations("classpath:/META-INF/resources/webjars/")
			.setCacheControl(CacheControl.maxAge(Duration.ofDays(365)))
			.resourceChain(true)
			.addResolver(new LiteWebJarsResourceResolver());
	}

}

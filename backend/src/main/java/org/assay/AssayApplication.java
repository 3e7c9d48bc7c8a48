package org.assay;

import java.time.Clock;

import org.springframework.boot.SpringApplication;
import org.springframework.boot.autoconfigure.SpringBootApplication;
import org.springframework.boot.context.properties.ConfigurationPropertiesScan;
import org.springframework.context.annotation.Bean;
import org.springframework.scheduling.annotation.EnableScheduling;

/**
 * The Assay server: a team validation queue for machine-drafted map features.
 *
 * <p>
 * Each top-level package under this one is an application module (see DEVELOPERS.md for
 * the modules and the direction of their dependencies).
 */
@SpringBootApplication
@ConfigurationPropertiesScan
@EnableScheduling
public class AssayApplication {

	/**
	 * The clock all modules read the time from, so tests can move it.
	 * @return the system clock in UTC
	 */
	@Bean
	Clock clock() {
		return Clock.systemUTC();
	}

	public static void main(String[] args) {
		SpringApplication.run(AssayApplication.class, args);
	}

}

package com.crustplan;

import org.springframework.boot.SpringApplication;
import org.springframework.boot.autoconfigure.SpringBootApplication;

@SpringBootApplication
public class CrustplanApplication {

	public static void main(String[] args) {
		SpringApplication.run(CrustplanApplication.class, args);
	}

}

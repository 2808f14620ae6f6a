package com.crustplan.engine.model;

import com.crustplan.engine.catalogue.ModelCatalogue;
import com.crustplan.engine.catalogue.ModelDocument;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;

/**
 * The model section of DEVELOPERS.md is generated from the engine's constants. Regenerate
 * it with {@code mvn test -Dtest=ModelDocumentTest -Dcrustplan.writeDocs=true}.
 */
class ModelDocumentTest {

	private static final Path GUIDE = Path.of("DEVELOPERS.md");

	@Test
	void shouldKeepTheContributorGuideEqualToTheCatalogue() throws IOException {
		String guide = Files.readString(GUIDE, StandardCharsets.UTF_8);
		int begin = guide.indexOf(ModelDocument.BEGIN);
		int end = guide.indexOf(ModelDocument.END);
		assertThat(begin).as("DEVELOPERS.md has the generated model block").isGreaterThanOrEqualTo(0);
		assertThat(end).isGreaterThan(begin);
		String generated = "\n\n" + ModelDocument.markdown(ModelCatalogue.sections());
		String current = guide.substring(begin + ModelDocument.BEGIN.length(), end);
		if (Boolean.getBoolean("crustplan.writeDocs")) {
			Files.writeString(GUIDE,
					guide.substring(0, begin + ModelDocument.BEGIN.length()) + generated + guide.substring(end),
					StandardCharsets.UTF_8);
			return;
		}
		assertThat(current).as("DEVELOPERS.md model block is stale: regenerate with -Dcrustplan.writeDocs=true")
			.isEqualTo(generated);
	}

	@Test
	void shouldNameASourceForEveryParameter() {
		assertThat(ModelCatalogue.allParameters()).isNotEmpty()
			.allSatisfy(p -> assertThat(p.source()).as(p.symbol() + " " + p.description()).isNotBlank());
	}

}

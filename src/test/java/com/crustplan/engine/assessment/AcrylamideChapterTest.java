package com.crustplan.engine.assessment;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.acrylamide.AcrylamideModel;

/** The acrylamide chapter of the model page lists every constant with its source. */
class AcrylamideChapterTest {

	@Test
	void sectionListsEquationsParametersAndLimits() {
		var section = AcrylamideChapter.section();
		assertTrue(section.equations().size() >= 4);
		assertTrue(section.equations().stream().anyMatch(e -> e.parameters().contains(AcrylamideModel.FORMATION_RATE)));
		assertTrue(section.limits().size() >= 3);
		assertTrue(AcrylamideModel.FORMATION_RATE.source().contains("Pedreschi, Kaack & Granby 2006 (150 and 190 °C)"));
		// every constant of the model, the warnings and the mitigations is listed on the
		// model page, with a source
		var listed = section.equations().stream().flatMap(e -> e.parameters().stream()).toList();
		for (var p : AcrylamideModel.parameters()) {
			assertTrue(listed.contains(p), p.symbol());
		}
		assertTrue(listed.containsAll(Mitigations.parameters()));
		assertTrue(listed.contains(AcrylamideWarnings.MAX_FRYING_C));
		assertTrue(listed.stream().noneMatch(p -> p.source().isBlank()));
	}

}

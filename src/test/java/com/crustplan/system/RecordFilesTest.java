package com.crustplan.system;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrlPattern;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.charset.StandardCharsets;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.security.test.context.support.WithMockUser;
import org.springframework.test.web.servlet.MockMvc;

import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;
import com.crustplan.setup.SavedSetup;
import com.crustplan.setup.SetupForm;
import com.crustplan.setup.SetupService;
import com.crustplan.surface.SavedSurface;
import com.crustplan.surface.SurfaceForm;
import com.crustplan.surface.SurfaceService;

/**
 * Surfaces and setups exported as files and read back by the list pages' import: a round
 * trip keeps every field; a malformed file is refused naming the field, and nothing
 * changes.
 */
@CrustplanTest
@WithMockUser(username = "chef", roles = "CHEF")
class RecordFilesTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	DemoData demo;

	@Autowired
	SurfaceService surfaces;

	@Autowired
	SetupService setups;

	String export(String url) throws Exception {
		return mvc.perform(get(url))
			.andExpect(status().isOk())
			.andExpect(header().string("Content-Disposition", containsString("attachment")))
			.andExpect(header().string("Content-Type", containsString("application/json")))
			.andReturn()
			.getResponse()
			.getContentAsString(StandardCharsets.UTF_8);
	}

	long importFile(String url, String json) throws Exception {
		String location = mvc
			.perform(multipart(url).file(
					new MockMultipartFile("file", "x.json", "application/json", json.getBytes(StandardCharsets.UTF_8)))
				.with(csrf()))
			.andExpect(redirectedUrlPattern("/*/*"))
			.andReturn()
			.getResponse()
			.getRedirectedUrl();
		return Long.parseLong(location.substring(location.lastIndexOf('/') + 1));
	}

	@Test
	void aSurfaceFileReadBackKeepsEveryField() throws Exception {
		long id = demo.surface("Chips, 10 mm, blanched");
		String file = export("/surfaces/" + id + ".json");
		assertThat(file).contains("\"kind\" : \"surface\"").contains("\"pretreatment\" : \"blanched\"");
		long copy = importFile("/surfaces/import", file);
		assertThat(copy).isNotEqualTo(id);
		SurfaceForm before = SurfaceForm.of(surfaces.get(id), TemperatureUnit.CELSIUS);
		SurfaceForm after = SurfaceForm.of(surfaces.get(copy), TemperatureUnit.CELSIUS);
		assertThat(after).isEqualTo(before);
	}

	@Test
	void aSetupFileReadBackKeepsEveryField() throws Exception {
		long id = demo.setup("Fryer, chips");
		long copy = importFile("/setups/import", export("/setups/" + id + ".json"));
		SavedSetup a = setups.get(id);
		SavedSetup b = setups.get(copy);
		assertThat(SetupForm.of(b, TemperatureUnit.CELSIUS)).isEqualTo(SetupForm.of(a, TemperatureUnit.CELSIUS));
	}

	@Test
	void everyDemoSetupRoundTrips() throws Exception {
		// pans and fryers with their bodies, ovens with steam, grills by flux or element
		for (SavedSetup s : java.util.List.copyOf(setups.all())) {
			long copy = importFile("/setups/import", export("/setups/" + s.getId() + ".json"));
			assertThat(SetupForm.of(setups.get(copy), TemperatureUnit.CELSIUS)).as(s.getName())
				.isEqualTo(SetupForm.of(s, TemperatureUnit.CELSIUS));
			setups.delete(copy);
		}
	}

	@ParameterizedTest(name = "{0}")
	@CsvSource(delimiter = '|',
			textBlock = """
					not JSON                  | {"kind": "surface",                                       | the file is not JSON
					another kind              | {"kind": "setup", "formatVersion": 1, "setup": {}}        | kind: must be "surface"
					another version           | {"kind": "surface", "formatVersion": 7, "surface": {}}    | formatVersion: must be 1
					no surface                | {"kind": "surface", "formatVersion": 1}                   | surface: is missing
					an unknown field          | {"kind": "surface", "formatVersion": 1, "surface": {"colour": "red"}} | surface.colour: is not a field of a surface
					text for a number         | {"kind": "surface", "formatVersion": 1, "surface": {"waterPct": "lots"}} | surface.waterPct: must be a number
					""")
	void aMalformedSurfaceFileIsRefusedNamingTheFieldAndChangesNothing(String what, String json, String reason)
			throws Exception {
		refused("/surfaces/import", json, reason);
	}

	@Test
	void aSurfaceFileWithAValueOutOfRangeIsRefusedNamingTheField() throws Exception {
		String file = export("/surfaces/" + demo.surface("Chips, 10 mm, blanched") + ".json");
		refused("/surfaces/import", file.replaceFirst("\"waterPct\" : [0-9.]+", "\"waterPct\" : 120"),
				"surface.waterPct:");
		// parts adding up to more than 100 %: the engine's check across fields
		refused("/surfaces/import", file.replaceFirst("\"starchPct\" : [0-9.]+", "\"starchPct\" : 60"),
				"surface.composition:");
		refused("/surfaces/import",
				file.replaceFirst("\"pretreatment\" : \"blanched\"", "\"pretreatment\" : \"fried\""),
				"surface.pretreatment:");
	}

	@Test
	void aSetupFileWithAWrongFieldIsRefusedNamingIt() throws Exception {
		String file = export("/setups/" + demo.setup("Fryer, chips") + ".json");
		refused("/setups/import", file.replaceFirst("\"fan\" : (true|false)", "\"fan\" : \"yes\""), "setup.fan:");
		refused("/setups/import", file.replaceFirst("\"mode\" : \"fryer\"", "\"mode\" : \"wok\""), "setup.mode");
	}

	@Test
	void anEmptyUploadIsRefused() throws Exception {
		refused("/surfaces/import", "", "the file is empty");
	}

	void refused(String url, String json, String reason) throws Exception {
		long surfacesBefore = surfaces.count();
		int setupsBefore = setups.all().size();
		mvc.perform(multipart(url)
			.file(new MockMultipartFile("file", "x.json", "application/json", json.getBytes(StandardCharsets.UTF_8)))
			.with(csrf()))
			.andExpect(status().isUnprocessableContent())
			.andExpect(content().string(containsString("id=\"import-error\"")))
			.andExpect(content().string(containsString("nothing was changed")))
			.andExpect(content().string(containsString(org.springframework.web.util.HtmlUtils.htmlEscape(reason))));
		assertThat(surfaces.count()).isEqualTo(surfacesBefore);
		assertThat(setups.all()).hasSize(setupsBefore);
	}

	@Test
	void aPlansSeriesComesAsCsvWithOneRowPerOutputTime() throws Exception {
		long id = demo.plan("Chips: blanch, rest, finish");
		String csv = mvc.perform(get("/plans/" + id + "/series.csv"))
			.andExpect(status().isOk())
			.andExpect(header().string("Content-Type", containsString("text/csv")))
			.andExpect(header().string("Content-Disposition", containsString("plan-chips-blanch-rest-finish.csv")))
			.andReturn()
			.getResponse()
			.getContentAsString();
		String[] lines = csv.split("\r\n");
		assertThat(lines[0]).startsWith("time_s,surface_temperature_C,");
		assertThat(lines.length).isGreaterThan(10);
		int columns = lines[0].split(",", -1).length;
		for (int i = 1; i < lines.length; i++) {
			assertThat(lines[i].split(",", -1)).hasSize(columns);
		}
		assertThat(lines[1]).startsWith("0.0,");
	}

}

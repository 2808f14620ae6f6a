package com.crustplan.setup;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.LinkedHashMap;
import java.util.Map;

import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.security.test.context.support.WithMockUser;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

import com.crustplan.CrustplanTest;
import com.crustplan.engine.heat.FryerBody;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;
import com.crustplan.engine.heat.HeatedBody;
import com.crustplan.engine.heat.PanBody;
import com.crustplan.engine.heat.PanMaterial;
import com.crustplan.system.TemperatureUnit;

/**
 * The pan's and the fryer's body on the setup form: defaults shown, bad values named,
 * saved and shown.
 */
@CrustplanTest
@WithMockUser(username = "chef", roles = "CHEF")
class EquipmentSetupPagesTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	SetupRepository setups;

	static MockHttpServletRequestBuilder pan(String name, String... overrides) {
		Map<String, String> p = new LinkedHashMap<>();
		p.put("name", name);
		p.put("mode", "pan");
		p.put("temperature", "220");
		p.put("temperatureUnit", "C");
		p.put("fatFilm", "true");
		p.put("flipEverySeconds", "60");
		p.put("panMaterial", "carbon-steel");
		p.put("panMassKg", "1.5");
		p.put("panDiameterCm", "30");
		p.put("panPowerKw", "3");
		p.put("panControl", "fixed-input");
		p.put("panCoverPct", "40");
		p.put("fryerOilLitres", "8");
		p.put("fryerHeaterKw", "3.2");
		p.put("fryerLoadKg", "0.5");
		for (int i = 0; i < overrides.length; i += 2) {
			p.put(overrides[i], overrides[i + 1]);
		}
		MockHttpServletRequestBuilder b = post("/setups/new").with(csrf());
		p.forEach(b::param);
		return b;
	}

	SavedSetup saved(String name) {
		return setups.findAll().stream().filter(s -> s.getName().equals(name)).findFirst().orElseThrow();
	}

	@Test
	void shouldPrefillTheDefaultsForATypicalLinePanAndFryer() throws Exception {
		SetupForm form = (SetupForm) mvc.perform(get("/setups/new"))
			.andExpect(status().isOk())
			.andReturn()
			.getModelAndView()
			.getModel()
			.get("form");
		// the engine's defaults (PanBody.DEFAULT, FryerBody.DEFAULT), each with its
		// source there
		assertThat(form.panMassKg()).isEqualTo(PanBody.DEFAULT.massKg());
		assertThat(form.panMaterial()).isEqualTo(PanBody.DEFAULT.material().key());
		assertThat(form.fryerOilLitres()).isEqualTo(FryerBody.DEFAULT.oilLitres());
		mvc.perform(get("/setups/new"))
			.andExpect(
					content().string(containsString("defaults for a typical line pan; change them if you know yours")))
			.andExpect(content()
				.string(containsString("defaults for a typical line fryer; change them if you know yours")))
			.andExpect(content().string(containsString("value=\"2.3\" aria-describedby=\"panMassKg-note\"")))
			.andExpect(content().string(containsString("value=\"28\" aria-describedby=\"panDiameterCm-note\"")))
			.andExpect(content().string(containsString("value=\"3.2\" aria-describedby=\"fryerHeaterKw-note\"")))
			.andExpect(content()
				.string(containsString("<option value=\"cast-iron\" selected=\"selected\">cast iron</option>")))
			.andExpect(content().string(containsString("Flame left as set")));
	}

	@Test
	void shouldSaveAPanWithItsBodyAndShowIt() throws Exception {
		mvc.perform(pan("Carbon-steel pan, fixed flame")).andExpect(redirectedUrl("/setups"));
		SavedSetup s = saved("Carbon-steel pan, fixed flame");
		assertThat(s.getPanMaterial()).isEqualTo("carbon-steel");
		assertThat(s.getPanMassKg()).isEqualTo(1.5);
		assertThat(s.getPanControl()).isEqualTo("fixed-input");
		assertThat(s.getFryerOilLitres()).as("a pan keeps no fryer settings").isNull();
		PanContact engine = (PanContact) SetupForm.of(s, TemperatureUnit.CELSIUS).toHeatSetup();
		assertThat(engine.body())
			.isEqualTo(new PanBody(PanMaterial.CARBON_STEEL, 1.5, 30, 3, HeatedBody.Control.FIXED_INPUT, 40));
		mvc.perform(get("/setups"))
			.andExpect(content().string(containsString(
					"carbon steel, 1.5\u00a0kg, 30\u00a0cm, 3\u00a0kW, flame left as set, 40\u00a0% covered")));
		mvc.perform(get("/setups/{id}/edit", s.getId()))
			.andExpect(content().string(containsString("value=\"1.5\" aria-describedby=\"panMassKg-note\"")))
			.andExpect(content().string(containsString("<option value=\"fixed-input\" selected=\"selected\"")));
	}

	@Test
	void shouldGiveAPanSentWithoutItsBodyTheDefaultOne() throws Exception {
		// a client of the form from before the body: a pan or fryer in the app always has
		// one
		mvc.perform(pan("Pan, no body sent", "panMaterial", "", "panMassKg", "", "panDiameterCm", "", "panPowerKw", "",
				"panControl", "", "panCoverPct", ""))
			.andExpect(redirectedUrl("/setups"));
		SavedSetup s = saved("Pan, no body sent");
		assertThat(s.getPanMaterial()).isEqualTo(PanBody.DEFAULT.material().key());
		assertThat(s.getPanMassKg()).isEqualTo(PanBody.DEFAULT.massKg());
		assertThat(s.getPanCoverPct()).isEqualTo(PanBody.DEFAULT.coverPct());
	}

	@Test
	void shouldSaveAFryerWithItsBodyAndAnOvenWithNone() throws Exception {
		mvc.perform(pan("Fryer, big batch", "mode", "fryer", "temperature", "170", "fryerOilLitres", "12",
				"fryerHeaterKw", "6", "fryerLoadKg", "1.2"))
			.andExpect(redirectedUrl("/setups"));
		SavedSetup f = saved("Fryer, big batch");
		assertThat(f.getFryerOilLitres()).isEqualTo(12.0);
		assertThat(f.getFryerLoadKg()).isEqualTo(1.2);
		assertThat(f.getPanMassKg()).as("a fryer keeps no pan settings").isNull();
		mvc.perform(get("/setups"))
			.andExpect(content().string(containsString("12\u00a0L oil, 6\u00a0kW heater, 1.2\u00a0kg per batch")));
		mvc.perform(pan("Oven, no body", "mode", "oven", "temperature", "180")).andExpect(redirectedUrl("/setups"));
		SavedSetup o = saved("Oven, no body");
		assertThat(o.getPanMassKg()).isNull();
		assertThat(o.getFryerOilLitres()).isNull();
	}

	@Test
	void shouldListTheDemoSkilletAndThePlanchaWithTheHeatKeptUp() throws Exception {
		// the demo skillet's flame is turned up to hold the pan (it was left as set: a
		// flame that only held the empty pan let two steaks draw it down to about 110 °C)
		mvc.perform(get("/setups"))
			.andExpect(content().string(
					containsString("cast iron, 2.3\u00a0kg, 28\u00a0cm, 2.5\u00a0kW, heat kept up, 50\u00a0% covered")))
			.andExpect(content().string(containsString(
					"carbon steel, 22.6\u00a0kg, 55\u00a0cm, 6\u00a0kW, heat kept up, 25\u00a0% covered")))
			.andExpect(content().string(containsString("8\u00a0L oil, 3.2\u00a0kW heater, 0.5\u00a0kg per batch")));
	}

	@Nested
	class BadValues {

		@Test
		void shouldNameEachPanFieldTheEngineRefuses() throws Exception {
			// the engine's ranges (PanBody): 0.3–60 kg, 12–120 cm, 0.2–30 kW, 1–100 %
			mvc.perform(pan("x", "panMassKg", "0.1"))
				.andExpect(status().isOk())
				.andExpect(model().attributeHasFieldErrorCode("form", "panMassKg", "engine.massKg"))
				.andExpect(content().string(containsString("must be from 0.3 to 60 kg")));
			mvc.perform(pan("x", "panDiameterCm", "5"))
				.andExpect(model().attributeHasFieldErrorCode("form", "panDiameterCm", "engine.diameterCm"));
			mvc.perform(pan("x", "panPowerKw", "50"))
				.andExpect(model().attributeHasFieldErrorCode("form", "panPowerKw", "engine.powerKw"));
			mvc.perform(pan("x", "panCoverPct", "150"))
				.andExpect(model().attributeHasFieldErrorCode("form", "panCoverPct", "engine.coverPct"));
			mvc.perform(pan("x", "panMaterial", "copper"))
				.andExpect(model().attributeHasFieldErrorCode("form", "panMaterial", "engine.material"))
				.andExpect(content().string(containsString("not a pan material")));
			mvc.perform(pan("x", "panControl", "by-hand"))
				.andExpect(model().attributeHasFieldErrorCode("form", "panControl", "engine.control"));
			mvc.perform(pan("x", "panMassKg", "heavy"))
				.andExpect(model().attributeHasFieldErrorCode("form", "panMassKg", "typeMismatch"));
		}

		@Test
		void shouldNameEachFryerFieldTheEngineRefuses() throws Exception {
			// the engine's ranges (FryerBody): 1–60 L, 0.5–40 kW, 0.01–10 kg
			mvc.perform(pan("x", "mode", "fryer", "temperature", "175", "fryerOilLitres", "0"))
				.andExpect(model().attributeHasFieldErrorCode("form", "fryerOilLitres", "engine.oilLitres"));
			mvc.perform(pan("x", "mode", "fryer", "temperature", "175", "fryerHeaterKw", "100"))
				.andExpect(model().attributeHasFieldErrorCode("form", "fryerHeaterKw", "engine.heaterKw"));
			mvc.perform(pan("x", "mode", "fryer", "temperature", "175", "fryerLoadKg", "20"))
				.andExpect(model().attributeHasFieldErrorCode("form", "fryerLoadKg", "engine.loadKg"));
		}

		@Test
		void shouldNameABadTemperatureAndABadBodyTogether() throws Exception {
			mvc.perform(pan("x", "temperature", "400", "panMassKg", "100"))
				.andExpect(model().attributeHasFieldErrors("form", "temperature", "panMassKg"));
		}

		@Test
		void shouldIgnoreBodyValuesTheModeDoesNotUse() throws Exception {
			// a grill has no body: a fryer value out of range on its hidden fieldset is
			// not an error
			mvc.perform(pan("Grill, stray fryer value", "mode", "grill", "temperature", "800", "fryerLoadKg", "99"))
				.andExpect(redirectedUrl("/setups"));
			assertThat(saved("Grill, stray fryer value").getFryerLoadKg()).isNull();
		}

	}

}

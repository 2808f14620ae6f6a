package com.crustplan.card;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.not;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.anonymous;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.view;

import java.util.List;

import jakarta.servlet.http.Cookie;

import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.security.test.context.support.WithMockUser;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import org.springframework.test.web.servlet.request.RequestPostProcessor;

import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;
import com.crustplan.plan.PlanInputs;
import com.crustplan.plan.PlanService;
import com.crustplan.plan.PlanStep;
import com.crustplan.plan.SavedPlan;
import com.crustplan.plan.SavedPlanService;
import com.crustplan.setup.SetupForm;
import com.crustplan.setup.SetupService;
import com.crustplan.surface.SurfaceForm;
import com.crustplan.surface.SurfaceService;
import com.crustplan.system.TemperatureUnit;
import com.crustplan.plan.SavedPlanRepository;

@CrustplanTest
@WithMockUser(username = "chef", roles = "CHEF")
class StationCardPagesTest {

	/** The no-break space the card keeps between a figure and its unit. */
	static final String NB = "\u00a0";

	@Autowired
	MockMvc mvc;

	@Autowired
	DemoData demo;

	@Autowired
	SavedPlanRepository plans;

	@Autowired
	SavedPlanService saved;

	@Autowired
	PlanService planner;

	@Autowired
	SurfaceService surfaces;

	@Autowired
	SetupService setups;

	static String both(int c, int f) {
		return c + NB + "°C" + NB + "/ " + f + NB + "°F";
	}

	long steak() {
		return demo.plan("Thick steak: sear, oven to 52 °C, rest");
	}

	long saveOneSetup(String surface, String setup, String stage, String name) throws Exception {
		MvcResult r = mvc
			.perform(post("/plans").with(csrf())
				.param("surfaceId", String.valueOf(demo.surface(surface)))
				.param("setupId", String.valueOf(demo.setup(setup)))
				.param("targetStage", stage)
				.param("horizonMinutes", "60")
				.param("name", name))
			.andExpect(status().is3xxRedirection())
			.andReturn();
		String url = r.getResponse().getRedirectedUrl();
		return Long.parseLong(url.substring(url.lastIndexOf('/') + 1));
	}

	@Test
	void shouldShowTheStepsWithTimesBothScalesAndTheFoodCodeForAStepPlan() throws Exception {
		mvc.perform(get("/plans/{id}/card", steak()))
			.andExpect(status().isOk())
			.andExpect(view().name("card/card"))
			.andExpect(content().string(containsString("Sirloin steak, 30 mm, patted dry")))
			.andExpect(content().string(containsString("Thickness 30\u00a0mm")))
			// the setups' dials, each in both scales (°F = °C × 9/5 + 32)
			.andExpect(content().string(containsString(both(230, 446))))
			.andExpect(content().string(containsString(both(180, 356))))
			// the checkpoints: into the pan, flips, probe, pull, rest, with clock times
			.andExpect(content().string(containsString("Into the pan at " + both(230, 446))))
			.andExpect(content().string(containsString("Flip")))
			.andExpect(content().string(containsString("Probe the core")))
			.andExpect(content().string(containsString("Pull at " + both(52, 126) + " core")))
			.andExpect(content().string(containsString("Off the heat at")))
			// FDA Food Code 2022, 3-401.11: whole cuts 63 °C (145 °F) for 15 s, minced 68
			// °C (155 °F), the code's own °F figures
			.andExpect(content().string(containsString("FDA Food Code 2022, §3-401.11")))
			.andExpect(content().string(containsString(both(63, 145))))
			.andExpect(content().string(containsString("minced " + both(68, 155))))
			.andExpect(content().string(containsString("Your local food code decides")))
			.andExpect(content().string(containsString("Hot pan")))
			.andExpect(content().string(containsString("class=\"svg-swatch\"")))
			// meat carries no acrylamide benchmark (Regulation (EU) 2017/2158 Annex IV
			// names none): no acrylamide section
			.andExpect(content().string(not(containsString("id=\"card-acrylamide\""))))
			.andExpect(content().string(containsString("card-a5.css")));
	}

	@Test
	void shouldNameTheCentresDonenessInTheTradesWordsWithItsCore() throws Exception {
		// pulled at 52 °C and rested, the centre coasts on: rare to medium by the kitchen
		// probe bands (common practice, CentreDoneness), with its figure in both scales
		mvc.perform(get("/plans/{id}/card", steak()))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("id=\"card-doneness\"")))
			.andExpect(content().string(org.hamcrest.Matchers.matchesPattern(
					"(?s).*; centre <strong>(rare|medium-rare|medium)</strong>(<span class=\"doneness-at\">, \\d+\u00a0°C\u00a0/ \\d+\u00a0°F at its hottest</span>)?</span></p>.*")));
		// chips have no cut face and no doneness word
		mvc.perform(get("/plans/{id}/card", demo.plan("Chips: blanch, rest, finish")))
			.andExpect(status().isOk())
			.andExpect(content().string(not(containsString("card-doneness"))));
	}

	@Test
	void shouldShowBothScalesWhateverTheCooksUnit() throws Exception {
		mvc.perform(get("/plans/{id}/card", steak()).cookie(new Cookie("crustplan-units", "F")))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString(both(230, 446))))
			.andExpect(content().string(containsString(both(63, 145))));
	}

	@Test
	void shouldShowTheAcrylamideZoneAndHotOilForChips() throws Exception {
		mvc.perform(get("/plans/{id}/card", demo.plan("Chips: blanch, rest, finish")))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("id=\"card-acrylamide\"")))
			// French fries: benchmark level 500 µg/kg, Regulation (EU) 2017/2158 Annex IV
			.andExpect(content().string(containsString("EU benchmark 500\u00a0µg/kg")))
			.andExpect(content().string(containsString("Hot oil")))
			.andExpect(content().string(containsString("Into the oil at " + both(140, 284))))
			// potato has no food-code minimum: the card says when a fry is cooked through
			.andExpect(content().string(not(containsString("FDA Food Code"))))
			.andExpect(content().string(containsString("Cooked through at")));
	}

	@Test
	void shouldGiveAOneSetupPlanItsLineAndThePoultryMinimum() throws Exception {
		long id = saveOneSetup("Chicken thigh, skin on", "Combi oven, dry fan", "golden", "Thighs for lunch");
		String html = mvc.perform(get("/plans/{id}/card", id))
			.andExpect(status().isOk())
			.andReturn()
			.getResponse()
			.getContentAsString();
		assertThat(html).contains("Into the oven at " + both(200, 392))
			.contains("Out at golden")
			.contains("fan on")
			// FDA Food Code 2022, 3-401.11 (A)(3): poultry 74 °C (165 °F)
			.contains(both(74, 165))
			.contains("Hot oven")
			.doesNotContain("minced");
	}

	long save(String name, PlanInputs in) {
		return saved.save(name, in.surface().name(), "steps", in, planner.plan(in), "chef").getId();
	}

	SurfaceForm surface(String name) {
		return SurfaceForm.of(surfaces.get(demo.surface(name)), TemperatureUnit.CELSIUS);
	}

	SetupForm setup(String name) {
		return SetupForm.of(setups.get(demo.setup(name)), TemperatureUnit.CELSIUS);
	}

	@Test
	void shouldSaySoWhenThePlanDoesNotReachItsTarget() throws Exception {
		// 10 mm chips take 6–8 min to golden at 175 °C (common practice, the
		// calibration test's figure): one minute of frying is not enough
		long id = save("One minute of chips",
				new PlanInputs(surface("Chips, 10 mm, blanched"), setup("Fryer, chips"), "golden", null, 1));
		mvc.perform(get("/plans/{id}/card", id))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("Target not reached in this plan")))
			.andExpect(content().string(containsString("No core figure")))
			.andExpect(content().string(not(containsString("Off the heat at"))));
	}

	@Test
	void shouldShowTheEndColourForAPlanAimedAtTheCoreAlone() throws Exception {
		SetupForm oven = setup("Fan oven, dry, roast finish");
		PlanInputs in = new PlanInputs(surface("Sirloin steak, 30 mm, patted dry"), oven, null, null, 60,
				List.of(new PlanStep(oven, oven.name(), null, 40.0, null, null, 55.0)), 55.0);
		mvc.perform(get("/plans/{id}/card", save("Oven to 55", in)))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("Colour at the end")))
			.andExpect(content().string(containsString("Pull at " + both(55, 131) + " core")))
			.andExpect(content().string(not(containsString("Target colour:"))));
	}

	@Test
	void shouldSwitchToA6AndRefuseAnUnknownSizeWithAReason() throws Exception {
		mvc.perform(get("/plans/{id}/card", steak()).param("size", "a6"))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("card-a6.css")));
		mvc.perform(get("/plans/{id}/card", steak()).param("size", "<b>a4</b>"))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("size: a card is printed at a5 or a6; shown at A5.")))
			.andExpect(content().string(containsString("card-a5.css")))
			.andExpect(content().string(not(containsString("<b>a4</b>"))));
	}

	@Test
	void shouldAnswer404ForAnUnknownPlan() throws Exception {
		mvc.perform(get("/plans/{id}/card", 987654321L)).andExpect(status().isNotFound());
	}

	@Test
	void shouldSayWhyWhenTheSavedInputsCannotBeReadWithoutFailing() throws Exception {
		long unreadable = plans
			.save(new SavedPlan("Unreadable card", "s", "t", "Golden", "{not json", true, 60.0, "chef"))
			.getId();
		mvc.perform(get("/plans/{id}/card", unreadable))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("cannot be read")));
	}

	@Test
	void shouldLinkTheCardFromTheSavedPlanPage() throws Exception {
		long id = steak();
		mvc.perform(get("/plans/{id}", id))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("href=\"/plans/" + id + "/card\"")))
			.andExpect(content().string(containsString("data-print")));
	}

	@Test
	void shouldHideMenuSignOutUnitSwitchAndActionsInThePlanPagesPrintStylesheet() throws Exception {
		String css = mvc.perform(get("/css/crustplan.css"))
			.andExpect(status().isOk())
			.andReturn()
			.getResponse()
			.getContentAsString();
		String print = css.substring(css.indexOf("@media print"));
		// the menu bar (.top), Sign out (.who), the °C/°F switch (.units), Delete
		// (.actions) and any button
		assertThat(print).contains(".top,").contains(".actions").contains(".units").contains(".who").contains("button");
		assertThat(print).contains("print-color-adjust: exact").contains("break-inside: avoid");
		mvc.perform(get("/plans/{id}", steak()))
			.andExpect(content().string(containsString("<header class=\"top\">")))
			.andExpect(content().string(containsString("<div class=\"actions\"")))
			.andExpect(content().string(containsString("class=\"units\"")));
	}

	@Nested
	class Access {

		int status(String path, RequestPostProcessor who) throws Exception {
			return mvc.perform(get(path).with(who)).andReturn().getResponse().getStatus();
		}

		@Test
		void shouldFollowThePlanPagesRulesForEveryone() throws Exception {
			long id = steak();
			for (RequestPostProcessor who : new RequestPostProcessor[] { anonymous(), user("cook").roles("COOK"),
					user("chef").roles("CHEF"), user("visitor").roles("VISITOR") }) {
				assertThat(status("/plans/" + id + "/card", who)).isEqualTo(status("/plans/" + id, who));
			}
			assertThat(status("/plans/" + id + "/card", user("cook").roles("COOK"))).isEqualTo(200);
			assertThat(status("/plans/" + id + "/card", anonymous())).isEqualTo(302);
		}

	}

}

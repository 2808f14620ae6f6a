package com.crustplan.system;

import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.not;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.security.test.context.support.WithMockUser;
import org.springframework.test.web.servlet.MockMvc;

import com.crustplan.CrustplanTest;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.surface.SurfaceForm;
import com.crustplan.surface.SurfaceService;

/** User-supplied text is shown as text: a script tag in a name or note never runs. */
@CrustplanTest
@WithMockUser(roles = "CHEF")
class EscapingTest {

	static final String SCRIPT = "<script>alert('crust')</script>";

	@Autowired
	MockMvc mvc;

	@Autowired
	SurfaceService surfaces;

	@Test
	void shouldShowAScriptTagInASurfaceNameAsText() throws Exception {
		SurfaceForm f = SurfaceForm.defaults(FoodCategory.FISH, SCRIPT, TemperatureUnit.CELSIUS);
		f = new SurfaceForm(f.name(), f.category(), f.product(), f.waterPct(), f.proteinPct(), f.fatPct(),
				f.reducingSugarPct(), f.sucrosePct(), f.starchPct(), f.fibrePct(), f.ashPct(), f.asparagineMgPerKg(),
				f.surfaceWaterGPerM2(), f.thicknessMm(), f.ph(), f.bicarbonateGPerKg(), f.acidGPerKg(),
				f.initialTemperature(), f.temperatureUnit(), "note " + SCRIPT, f.shape(), f.pretreatment());
		long id = surfaces.create(f).getId();
		for (String page : new String[] { "/surfaces", "/surfaces/" + id, "/surfaces/" + id + "/edit",
				"/surfaces/" + id + "/delete", "/plan" }) {
			mvc.perform(get(page))
				.andExpect(status().isOk())
				.andExpect(content().string(not(containsString(SCRIPT))))
				.andExpect(content().string(containsString("&lt;script&gt;")));
		}
		// and the plan page carries no inline script at all (the content security policy
		// forbids it)
		mvc.perform(get("/plan")).andExpect(content().string(not(containsString("<script>"))));
	}

}

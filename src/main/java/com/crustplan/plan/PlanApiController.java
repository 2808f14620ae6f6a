package com.crustplan.plan;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;

import com.crustplan.api.Bound;
import com.crustplan.api.InvalidRequestException;
import com.crustplan.engine.assessment.Mitigation;
import com.crustplan.engine.assessment.Product;
import com.crustplan.engine.cook.Sample;
import com.crustplan.engine.food.BrowningStage;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.SurfaceField;
import com.crustplan.surface.CategoryDefaults;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.myoglobin.InteriorProfile;
import com.crustplan.system.MessageText;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;

/**
 * JSON API v1: categories with defaults, and computing a plan without saving it. All in
 * °C and SI, text too. Errors are answered as problem details by the API's one error
 * advice ({@code api/ApiErrors}).
 */
@RestController
@RequestMapping(path = "/api/v1", produces = MediaType.APPLICATION_JSON_VALUE)
class PlanApiController {

	private final PlanService planner;

	private final MessageText text;

	PlanApiController(PlanService planner, MessageText text) {
		this.planner = planner;
		this.text = text;
	}

	@GetMapping("/categories")
	List<Map<String, Object>> categories() {
		List<Map<String, Object>> out = new ArrayList<>();
		for (FoodCategory c : FoodCategory.values()) {
			Map<String, Object> d = CategoryDefaults.of(c, List.of(SurfaceField.values()));
			d.put("shape", c.defaultShape().key());
			List<Map<String, Object>> stages = new ArrayList<>();
			for (BrowningStage s : c.stages()) {
				Map<String, Object> m = new LinkedHashMap<>();
				m.put("key", s.key());
				m.put("label", s.label());
				m.put("lightness", s.lightness());
				m.put("extent", s.extent());
				stages.add(m);
			}
			List<Map<String, Object>> products = new ArrayList<>();
			for (Product p : Product.of(c)) {
				Map<String, Object> m = new LinkedHashMap<>();
				m.put("key", p.key());
				m.put("label", p.label());
				m.put("benchmarkUgPerKg", p.benchmark().map(b -> b.microgramsPerKg()).orElse(null));
				m.put("default", p == Product.defaultFor(c));
				m.put("shape", p.usualShape().key());
				products.add(m);
			}
			Map<String, Object> cat = new LinkedHashMap<>();
			cat.put("key", c.key());
			cat.put("label", c.label());
			cat.put("defaults", d);
			cat.put("stages", stages);
			cat.put("products", products);
			out.add(cat);
		}
		return out;
	}

	@PostMapping("/plans")
	ResponseEntity<PlanResponse> plan(@RequestBody(required = false) Bound<PlanBody> body) {
		PlanBody.PlanRequest req = Bound.present(body, "send a JSON object with surface, heat (or steps) and target")
			.check(PlanBody::toRequest);
		try {
			PlanReport r = req.steps() != null
					? planner.planSteps(req.surface(), req.product(), req.steps().steps(), req.steps().labels(),
							req.target(), req.coreTargetC(), req.horizonMinutes())
					: planner.plan(req.surface(), req.product(), req.setup(), req.target(), req.horizonMinutes(),
							req.mitigations());
			return ResponseEntity.ok()
				.contentType(MediaType.APPLICATION_JSON)
				.body(PlanResponse.of(r, text, req.deprecations()));
		}
		catch (InvalidInputException e) {
			// the planner's checks (horizon, a lightness the path never reaches) in the
			// request's terms
			String f = e.field();
			String field = f.startsWith("target") || f.startsWith("steps") || f.equals("horizonMinutes")
					|| f.contains(".") ? f : "input." + f;
			throw InvalidRequestException.of(field, e.reason());
		}
	}

	record Acrylamide(Double crustUgPerKg, Double portionUgPerKg, Double benchmarkUgPerKg, String zone, String product,
			String basis, List<Change> mitigations) {
	}

	/**
	 * One acrylamide-reducing change, as the engine computed it (µg/kg as eaten, minutes
	 * to target).
	 */
	record Change(String code, String title, String change, boolean applicable, String reason, String basis,
			Double beforeUgPerKg, Double afterUgPerKg, Double beforeMinutes, Double afterMinutes, String source) {

		static Change of(Mitigation m, MessageText text) {
			return new Change(m.code(), text.celsius(m.title()), text.celsius(m.change()), m.applicable(),
					text.celsius(m.reason()), text.celsius(m.basis().meaning()), PlanReport.finite(m.beforeUgPerKg()),
					PlanReport.finite(m.afterUgPerKg()), PlanReport.finite(m.beforeMinutes()),
					PlanReport.finite(m.afterMinutes()), m.source());
		}

	}

	/**
	 * {@code heatSourceTemperatureC}, the pan's or the oil's, only when the heat has a
	 * body.
	 */
	record Series(List<Double> timeS, List<Double> surfaceTemperatureC, List<Double> coreTemperatureC,
			List<Double> surfaceWaterActivity, List<Double> lightness, List<String> colorHex,
			@JsonInclude(JsonInclude.Include.NON_NULL) List<Double> heatSourceTemperatureC) {
	}

	record Warning(String code, String message) {
	}

	/**
	 * One step as run: from and to (s from the start), what ended it, and the food at its
	 * end.
	 */
	record StepOut(int index, String mode, double temperatureC, double startS, double endS, String endedBy,
			double coreAtEndC, double surfaceAtEndC) {
	}

	/**
	 * Which target came first and by how much (s); the text says it, or which target was
	 * missed.
	 */
	record TargetOrder(String first, Double leadS, String text) {
	}

	record Checkpoint(double atS, String kind, String text) {
	}

	/**
	 * The inside of meat, poultry or fish when it comes off: each grid layer from face 0
	 * (depth, share of pigment denatured, hottest °C, colour), the crust and cooked band
	 * under each face (mm; the second face absent for a round piece), and the centre.
	 */
	record Interior(List<InteriorLayer> profile, double crustMm, Double crustOtherFaceMm, double cookedBandMm,
			Double cookedBandOtherFaceMm, boolean cookedThrough, double centrePeakTemperatureC,
			double centreDenaturedFraction, String centreCode, String centre, String band, double atS) {

		static Interior of(InteriorProfile p, MessageText text) {
			List<InteriorLayer> layers = p.layers()
				.stream()
				.map(l -> new InteriorLayer(l.depthMm(), l.denatured(), l.peakC(), l.colour().lightness(),
						l.colour().a(), l.colour().b(), l.colour().hex()))
				.toList();
			return new Interior(layers, p.crustMm()[0], PlanReport.finite(p.crustMm()[1]), p.bandMm()[0],
					PlanReport.finite(p.bandMm()[1]), p.cookedThrough(), p.centrePeakC(), p.centreDenatured(),
					p.centre().code(), text.celsius(p.centre()), text.celsius(p.band()), p.atS());
		}

	}

	record InteriorLayer(double depthMm, double denaturedFraction, double peakTemperatureC, double lightness, double a,
			double b, String colorHex) {
	}

	/**
	 * The answer; a plan in steps adds its steps, core target, target order and timeline
	 * (absent otherwise). Water and oil at the target are g per 100 g of the whole piece
	 * as it is when it reaches the colour target, its frying oil included (null where
	 * that target was not reached).
	 */
	record PlanResponse(boolean reached, String outcome, Double timeToTargetS, @JsonProperty("pH") double ph,
			Double coreTemperatureAtTargetC, Double waterAtTargetPct, Double oilAtTargetPct, String target,
			String targetColorHex, Acrylamide acrylamide, Series series, List<Warning> warnings, List<String> cautions,
			List<String> assumptions, @JsonInclude(JsonInclude.Include.NON_EMPTY) List<String> deprecations,
			@JsonInclude(JsonInclude.Include.NON_NULL) List<StepOut> steps,
			@JsonInclude(JsonInclude.Include.NON_NULL) Double coreTargetC,
			@JsonInclude(JsonInclude.Include.NON_NULL) Double coreTargetReachedS,
			@JsonInclude(JsonInclude.Include.NON_NULL) TargetOrder targets,
			@JsonInclude(JsonInclude.Include.NON_NULL) List<Checkpoint> timeline,
			@JsonInclude(JsonInclude.Include.NON_NULL) Interior interior) {

		static PlanResponse of(PlanReport r, MessageText text, List<String> deprecations) {
			List<Double> t = new ArrayList<>();
			List<Double> surface = new ArrayList<>();
			List<Double> core = new ArrayList<>();
			List<Double> aw = new ArrayList<>();
			List<Double> lightness = new ArrayList<>();
			List<String> hex = new ArrayList<>();
			List<Double> source = new ArrayList<>();
			boolean hasBody = false;
			for (Sample s : r.result().series()) {
				source.add(PlanReport.finite(s.heatSourceTemperatureC()));
				hasBody |= Double.isFinite(s.heatSourceTemperatureC());
				t.add(PlanReport.finite(s.timeS()));
				surface.add(PlanReport.finite(s.surfaceTemperatureC()));
				core.add(PlanReport.finite(s.coreTemperatureC()));
				aw.add(PlanReport.finite(s.surfaceWaterActivity()));
				lightness.add(PlanReport.finite(s.colour().lightness()));
				hex.add(s.colourHex());
			}
			AcrylamideView a = r.acrylamide();
			StepsReport st = r.steps();
			List<StepOut> steps = null;
			List<Checkpoint> timeline = null;
			TargetOrder order = null;
			if (st != null) {
				steps = st.records()
					.stream()
					.map(x -> new StepOut(x.index(), st.steps().get(x.index()).setup().mode(),
							st.steps().get(x.index()).setup().temperatureC(), x.startS(), x.endS(),
							x.endedBy().name().toLowerCase(Locale.ROOT), x.coreAtEndC(), x.surfaceAtEndC()))
					.toList();
				timeline = st.timeline()
					.stream()
					.map(c -> new Checkpoint(c.timeS(), c.kind(), text.celsius(c.text())))
					.toList();
				order = new TargetOrder(st.firstTarget(), st.firstTargetLeadS(),
						st.targetOrder() == null ? null : text.celsius(st.targetOrder()));
			}
			return new PlanResponse(r.reached(), text.celsius(r.result().explanation()), r.timeToTargetS(),
					r.surface().ph(), r.coreTemperatureAtTargetC(), r.waterAtTargetPct(), r.oilAtTargetPct(),
					text.celsius(r.targetLabel()), r.targetHex(),
					new Acrylamide(a.crustUgPerKg(), a.portionUgPerKg(), a.benchmarkUgPerKg(), a.zone(), a.product(),
							text.celsius(a.basis()), a.mitigations().stream().map(m -> Change.of(m, text)).toList()),
					new Series(t, surface, core, aw, lightness, hex, hasBody ? source : null),
					r.warnings().stream().map(w -> new Warning(w.code(), text.celsius(w.message()))).toList(),
					text.celsius(r.cautions()), text.celsius(r.result().assumptions()), deprecations, steps,
					st == null ? null : st.coreTargetC(), st == null ? null : st.coreTargetReachedS(), order, timeline,
					r.hasCutFace() ? Interior.of(r.cutFace().profile(), text) : null);
		}

	}

}

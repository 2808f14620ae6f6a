package com.crustplan.plan.search;

import java.security.Principal;
import java.util.ArrayList;
import java.util.List;

import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;

import com.crustplan.api.Bound;
import com.crustplan.api.FieldErrors;
import com.crustplan.api.InvalidRequestException;
import com.crustplan.engine.assessment.AcrylamideZone;
import com.crustplan.engine.assessment.BenchmarkLevel;
import com.crustplan.engine.assessment.RiskMap;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.system.Formats;
import com.crustplan.system.TemperatureUnit;

import com.fasterxml.jackson.annotation.JsonInclude;

/**
 * JSON API v1: which setting reaches a target in time ({@code POST /api/v1/plans/search})
 * and a settings × time grid ({@code POST /api/v1/maps}). Bodies as the plans API's, °C
 * and SI, errors as problem details with the field named ({@code api/ApiErrors}).
 */
@RestController
@RequestMapping(path = "/api/v1", produces = MediaType.APPLICATION_JSON_VALUE)
class SearchApiController {

	private final SettingSearch search;

	private final SearchReader reader;

	SearchApiController(SettingSearch search, SearchReader reader) {
		this.search = search;
		this.reader = reader;
	}

	record SearchRequest(SearchReader.Food food, List<HeatSetup> settings, SearchGoal goal) {
	}

	@PostMapping("/plans/search")
	ResponseEntity<SearchResponse> search(@RequestBody(required = false) Bound<SearchBody> body, Principal user) {
		SearchRequest req = Bound
			.present(body, "send a JSON object with surface (or surfaceId), heat, target and withinMinutes")
			.check((b, errors) -> read(b, user, errors));
		try {
			SearchAnswer a = search.search(req.food().surface(), req.food().product(), req.settings(), req.goal(),
					TemperatureUnit.CELSIUS);
			return ResponseEntity.ok().contentType(MediaType.APPLICATION_JSON).body(SearchResponse.of(a));
		}
		catch (InvalidInputException e) {
			throw InvalidRequestException.of(e.field().startsWith("target") || e.field().startsWith("range") ? e.field()
					: "surface." + e.field(), e.reason());
		}
	}

	private SearchRequest read(SearchBody b, Principal user, FieldErrors errors) {
		SearchReader.Food food = reader.food(b.surface(), b.surfaceId(), user, errors);
		HeatSetup template = reader.template(b.heat(), b.range(), errors);
		SettingRange range = reader.range(b.range(), template, errors);
		List<HeatSetup> settings = reader.settings(range, template, errors);
		Target colour = reader.colour(b.target(), food == null ? null : food.surface().category(), errors);
		Double core = reader.core(b.target(), errors);
		if (b.target() == null && !errors.has("target")) {
			errors.add("target", "is required (a JSON object): a stage or lightness, a coreTemperatureC, or both");
		}
		else if (colour == null && core == null && !errors.hasUnder("target")) {
			errors.add("target", "give a stage or lightness, a coreTemperatureC, or both");
		}
		Double within = SearchReader.minutes("withinMinutes", b.withinMinutes(), null, errors);
		SearchReader.checkWork(range, within, "withinMinutes", errors);
		if (!errors.isEmpty()) {
			return null;
		}
		return new SearchRequest(food, settings,
				new SearchGoal(colour, core, within, b.underBenchmark() != null && b.underBenchmark()));
	}

	/** A setting as the answer gives it: mode, temperature, and an oven's steam share. */
	record Setting(String label, String mode, double temperatureC,
			@JsonInclude(JsonInclude.Include.NON_NULL) Double steamPct) {

		static Setting of(HeatSetup h) {
			return new Setting(Formats.apiText(SettingSearch.label(h, TemperatureUnit.CELSIUS)), h.mode(),
					h.temperatureC(), h instanceof Oven o ? o.steamPct() : null);
		}

	}

	/**
	 * One setting tried: the times (s, null where not asked or not reached within the
	 * time), the food then.
	 */
	record Tried(Setting setting, Double colourReachedS, Double coreReachedS, Double doneS, boolean inTime,
			Double portionUgPerKg, boolean underBenchmark, Double coreAtDoneC, String colorHex, String stage,
			boolean satisfies, boolean marked) {

		static Tried of(Trial t, SearchGoal g, boolean marked) {
			return new Tried(Setting.of(t.setup()), finite(t.colourS()), finite(t.coreS()), finite(t.doneS()),
					t.inTime(), finite(t.portionUgPerKg()), t.underBenchmark(), finite(t.coreAtDoneC()), t.hexAtDone(),
					t.stageAtDone(), t.satisfies(g), marked);
		}

	}

	record Goal(String stage, Double lightness, Double coreTemperatureC, double withinMinutes, boolean underBenchmark) {
	}

	record Verified(Double timeToGoalS, Double coreC, Double portionUgPerKg) {
	}

	record Alternative(String code, String change, boolean works, Tried best, String outcome) {
	}

	record SearchResponse(boolean found, Goal goal, String markedBy, Double benchmarkUgPerKg, Integer bestIndex,
			Verified verified, List<Tried> settings, List<String> why, List<Alternative> alternatives,
			List<String> notes, List<String> cautions) {

		static SearchResponse of(SearchAnswer a) {
			SearchGoal g = a.goal();
			List<Tried> tried = new ArrayList<>();
			for (int i = 0; i < a.trials().size(); i++) {
				tried.add(Tried.of(a.trials().get(i), g, i == a.bestIndex()));
			}
			Target c = g.colour();
			return new SearchResponse(a.found(),
					new Goal(c == null ? null : c.stage(), c == null ? null : c.lightness(), g.coreC(),
							g.withinMinutes(), g.underBenchmark()),
					a.markedBy(), a.benchmarkUgPerKg(), a.found() ? a.bestIndex() : null,
					a.verified() == null ? null
							: new Verified(finite(a.verified().timeS()), finite(a.verified().coreC()),
									finite(a.verified().portionUgPerKg())),
					tried, Formats.apiText(a.why()),
					a.alternatives()
						.stream()
						.map(x -> new Alternative(x.code(), Formats.apiText(x.change()), x.works(),
								x.best() == null ? null : Tried.of(x.best(), g, false), Formats.apiText(x.outcome())))
						.toList(),
					Formats.apiText(a.notes()), SearchCautions.ALL);
		}

	}

	record MapRequest(SearchReader.Food food, HeatSetup template, SettingRange range, Target target, double stepS,
			double maxS) {
	}

	@PostMapping("/maps")
	ResponseEntity<MapResponse> map(@RequestBody(required = false) Bound<MapBody> body, Principal user) {
		MapRequest req = Bound.present(body, "send a JSON object with surface (or surfaceId), heat and range")
			.check((b, errors) -> read(b, user, errors));
		try {
			List<SettingMap.Row> rows = SettingMap.compute(req.food().surface(), req.food().product(), req.template(),
					req.range(), req.target(), req.stepS(), req.maxS());
			return ResponseEntity.ok().contentType(MediaType.APPLICATION_JSON).body(MapResponse.of(req, rows));
		}
		catch (InvalidInputException e) {
			String f = e.field();
			throw InvalidRequestException.of(
					f.startsWith("target") || f.startsWith("range") || f.equals("stepMinutes") ? f : "range",
					e.reason());
		}
	}

	/**
	 * Longest map unless told: 20 min, longer than most fries and sears (common
	 * practice).
	 */
	static final double DEFAULT_MAP_MINUTES = 20;

	private MapRequest read(MapBody b, Principal user, FieldErrors errors) {
		SearchReader.Food food = reader.food(b.surface(), b.surfaceId(), user, errors);
		HeatSetup template = reader.template(b.heat(), b.range(), errors);
		SettingRange range = reader.range(b.range(), template, errors);
		reader.settings(range, template, errors);
		Target colour = reader.colour(b.target(), food == null ? null : food.surface().category(), errors);
		if (b.target() != null && b.target().coreTemperatureC() != null) {
			errors.add("target.coreTemperatureC", "a map shows the core in every cell; give a colour target only");
		}
		Double minutes = SearchReader.minutes("minutes", b.minutes(), DEFAULT_MAP_MINUTES, errors);
		Double step = b.stepMinutes() == null ? 1.0 : b.stepMinutes();
		if (!(step >= 0.5 && step <= 60)) {
			errors.add("stepMinutes", "must be from 0.5 to 60 minutes");
		}
		else if (minutes != null && minutes / step > SettingMap.MAX_COLUMNS + 1e-9) {
			errors.add("stepMinutes",
					"at most " + SettingMap.MAX_COLUMNS + " time steps per map after the start (this one has "
							+ (int) Math.ceil(minutes / step) + "): use a longer stepMinutes or fewer minutes");
		}
		else if (minutes != null && step > minutes) {
			errors.add("stepMinutes", "must not be longer than minutes");
		}
		SearchReader.checkWork(range, minutes, "minutes", errors);
		if (!errors.isEmpty()) {
			return null;
		}
		return new MapRequest(food, template, range, colour, step * 60, minutes * 60);
	}

	record Cell(double timeS, String stage, String stageLabel, String colorHex, Double coreC, Double portionUgPerKg,
			@JsonInclude(JsonInclude.Include.NON_NULL) String zone) {
	}

	record MapRow(Setting setting, @JsonInclude(JsonInclude.Include.NON_NULL) Double targetReachedS, List<Cell> cells) {
	}

	record MapResponse(String category, String product, String mode, Double benchmarkUgPerKg, String target,
			List<Double> timesS, List<MapRow> rows, int cells, List<String> cautions) {

		static MapResponse of(MapRequest req, List<SettingMap.Row> rows) {
			var category = req.food().surface().category();
			var path = category.colourPath();
			List<Double> times = new ArrayList<>();
			List<MapRow> out = new ArrayList<>();
			int n = 0;
			for (SettingMap.Row r : rows) {
				List<Cell> cells = new ArrayList<>();
				for (RiskMap.Cell c : r.row().cells()) {
					if (out.isEmpty()) {
						times.add(c.timeS());
					}
					cells.add(new Cell(c.timeS(), c.stageKey(), c.stageLabel(), path.colourAt(c.browningExtent()).hex(),
							finite(c.coreTemperatureC()), finite(c.portionUgPerKg()), zone(c.zone())));
				}
				n += cells.size();
				out.add(new MapRow(Setting.of(r.setup()), req.target() == null ? null : finite(r.row().targetTimeS()),
						cells));
			}
			Target t = req.target();
			return new MapResponse(category.key(), req.food().product().key(), req.template().mode(),
					req.food().product().benchmark().map(BenchmarkLevel::microgramsPerKg).orElse(null),
					t == null ? null : t.stage() != null ? t.stage() : "L* " + t.lightness(), times, out, n,
					SearchCautions.ALL);
		}

	}

	static String zone(AcrylamideZone z) {
		return switch (z) {
			case LOW -> "low";
			case ELEVATED -> "elevated";
			case HIGH -> "high";
			default -> null;
		};
	}

	static Double finite(double v) {
		return Double.isFinite(v) ? v : null;
	}

}

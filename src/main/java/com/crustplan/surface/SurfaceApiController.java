package com.crustplan.surface;

import java.net.URI;
import java.time.Instant;
import java.util.List;

import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;

import com.crustplan.engine.assessment.Pretreatment;
import com.crustplan.api.Bound;
import com.crustplan.api.FieldErrors;
import com.crustplan.api.InvalidRequestException;
import com.crustplan.engine.input.InvalidInputException;

import com.fasterxml.jackson.annotation.JsonProperty;

/**
 * JSON API v1 for saved surfaces. The body's {@code surface} is the same object the plan
 * API takes ({@link SurfaceBody}); it is saved through {@link SurfaceService}, one
 * transaction per save, and 201 is answered only after that transaction has committed.
 * Errors are answered as problem details by the API's one error advice
 * ({@code api/ApiErrors}). All temperatures in °C.
 */
@RestController
@RequestMapping(path = "/api/v1/surfaces", produces = MediaType.APPLICATION_JSON_VALUE)
class SurfaceApiController {

	private final SurfaceService surfaces;

	SurfaceApiController(SurfaceService surfaces) {
		this.surfaces = surfaces;
	}

	@GetMapping
	List<Listed> list() {
		return surfaces.all().stream().map(s -> new Listed(s.getId(), s.getName(), s.getCategory())).toList();
	}

	@GetMapping("/{id}")
	SurfaceJson get(@PathVariable long id) {
		return SurfaceJson.of(surfaces.get(id));
	}

	@PostMapping
	ResponseEntity<SurfaceJson> create(@RequestBody(required = false) Bound<SaveBody> body) {
		SurfaceForm form = Bound.present(body, "send a JSON object with name and surface").check(SaveBody::toForm);
		SavedSurface saved;
		try {
			saved = surfaces.create(form);
		}
		catch (InvalidInputException e) {
			// the engine's checks, run again inside the save: named in the request's
			// terms
			throw InvalidRequestException.of("surface." + e.field(), e.reason());
		}
		return ResponseEntity.created(URI.create("/api/v1/surfaces/" + saved.getId()))
			.contentType(MediaType.APPLICATION_JSON)
			.body(SurfaceJson.of(saved));
	}

	/**
	 * A save body: {@code name} (required), {@code notes} and the {@code surface} as a
	 * plan takes it.
	 */
	record SaveBody(String name, String notes, SurfaceBody surface, String pretreatment) {

		/** Longest name and notes a saved surface keeps (the columns' lengths). */
		static final int NAME_MAX = 80;

		static final int NOTES_MAX = 1000;

		/**
		 * The page form's record of the same surface, so the API saves exactly what the
		 * form would.
		 */
		SurfaceForm toForm(FieldErrors errors) {
			String n = errors.text("name", name, NAME_MAX);
			if (n == null && !errors.has("name")) {
				errors.add("name", "is required: give the surface a name");
			}
			String text = errors.text("notes", notes, NOTES_MAX);
			String done = errors.text("pretreatment", pretreatment, 16);
			if (done != null && Pretreatment.byKey(done).isEmpty()) {
				errors.add("pretreatment", "must be soaked, blanched or empty for nothing done before cooking");
			}
			SurfaceBody given = errors.requireObject("surface", surface);
			SurfaceBody.Read read = given == null ? null : given.read(errors);
			if (!errors.isEmpty()) {
				return null;
			}
			return SurfaceForm.of(read.surface(), n, given.productKey(read), text, done);
		}

	}

	record Listed(long id, String name, String category) {
	}

	/**
	 * A saved surface in the same field names as the request's {@code surface} object.
	 */
	record SurfaceJson(long id, String name, String category, String product, double waterPct, double proteinPct,
			double fatPct, double reducingSugarPct, double sucrosePct, double starchPct, double fibrePct, double ashPct,
			double asparagineMgPerKg, double surfaceWaterGPerM2, double thicknessMm, @JsonProperty("pH") Double ph,
			double bicarbonateGPerKg, double acidGPerKg, double initialTemperatureC, String shape, String notes,
			String pretreatment, Instant updatedAt) {

		static SurfaceJson of(SavedSurface s) {
			return new SurfaceJson(s.getId(), s.getName(), s.getCategory(), s.getProduct(), s.getWaterPct(),
					s.getProteinPct(), s.getFatPct(), s.getReducingSugarPct(), s.getSucrosePct(), s.getStarchPct(),
					s.getFibrePct(), s.getAshPct(), s.getAsparagineMgPerKg(), s.getSurfaceWaterGPerM2(),
					s.getThicknessMm(), s.getPh(), s.getBicarbonateGPerKg(), s.getAcidGPerKg(),
					s.getInitialTemperatureC(), s.getShape(), s.getNotes(), s.getPretreatment(), s.getUpdatedAt());
		}

	}

}

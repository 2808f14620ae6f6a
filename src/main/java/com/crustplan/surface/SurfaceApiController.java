package com.crustplan.surface;

import java.net.URI;
import java.time.Instant;
import java.util.List;

import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.dao.ConcurrencyFailureException;
import org.springframework.dao.DataAccessResourceFailureException;
import org.springframework.dao.UncategorizedDataAccessException;
import org.springframework.http.HttpStatus;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.transaction.CannotCreateTransactionException;
import org.springframework.transaction.TransactionSystemException;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;
import org.springframework.web.method.annotation.MethodArgumentTypeMismatchException;

import com.crustplan.engine.food.Composition;
import com.crustplan.engine.food.InvalidInputException;
import com.crustplan.engine.food.Surface;
import com.crustplan.plan.ApiError;
import com.crustplan.plan.PlanRequestReader;
import com.crustplan.system.NotFoundException;
import com.crustplan.system.TemperatureUnit;

import com.fasterxml.jackson.annotation.JsonProperty;
import tools.jackson.databind.json.JsonMapper;

/**
 * JSON API v1 for saved surfaces. The body is read by the plan API's reader (same fields, same field
 * errors) and saved through {@link SurfaceService}, one transaction per save; 201 is answered only
 * after that transaction has committed. All temperatures in °C.
 */
@RestController
@RequestMapping(path = "/api/v1/surfaces", produces = MediaType.APPLICATION_JSON_VALUE)
class SurfaceApiController {

	private static final Logger log = LoggerFactory.getLogger(SurfaceApiController.class);

	private final SurfaceService surfaces;

	private final JsonMapper json;

	SurfaceApiController(SurfaceService surfaces, JsonMapper json) {
		this.surfaces = surfaces;
		this.json = json;
	}

	@GetMapping
	List<Listed> list() {
		return surfaces.all().stream().map(s -> new Listed(s.getId(), s.getName(), s.getCategory())).toList();
	}

	@GetMapping("/{id}")
	SurfaceJson get(@PathVariable long id) {
		return SurfaceJson.of(surfaces.get(id));
	}

	@PostMapping(consumes = MediaType.ALL_VALUE)
	ResponseEntity<SurfaceJson> create(@RequestBody(required = false) String body) {
		PlanRequestReader.SurfaceRequest req = PlanRequestReader.readSurface(body, json);
		SavedSurface saved = surfaces.create(form(req));
		return ResponseEntity.created(URI.create("/api/v1/surfaces/" + saved.getId()))
			.contentType(MediaType.APPLICATION_JSON)
			.body(SurfaceJson.of(saved));
	}

	/** The page form's record of the same surface, so the API saves exactly what the form would. */
	private static SurfaceForm form(PlanRequestReader.SurfaceRequest r) {
		Surface s = r.surface();
		Composition c = s.composition();
		return new SurfaceForm(r.name(), s.category().key(), r.product(), c.waterPct(), c.proteinPct(), c.fatPct(),
				c.reducingSugarPct(), c.sucrosePct(), c.starchPct(), c.fibrePct(), c.ashPct(), s.asparagineMgPerKg(),
				s.surfaceWaterGPerM2(), s.thicknessMm(), s.phOverride(), s.bicarbonateGPerKg(), s.acidGPerKg(),
				s.initialTemperatureC(), TemperatureUnit.CELSIUS.code(), r.notes());
	}

	@ExceptionHandler(PlanRequestReader.BadRequest.class)
	ResponseEntity<ApiError> badRequest(PlanRequestReader.BadRequest e) {
		return ResponseEntity.badRequest().contentType(MediaType.APPLICATION_JSON).body(new ApiError(e.errors()));
	}

	/** The engine's checks, run again inside the save: named in the request's terms. */
	@ExceptionHandler(InvalidInputException.class)
	ResponseEntity<ApiError> invalid(InvalidInputException e) {
		return ResponseEntity.badRequest()
			.contentType(MediaType.APPLICATION_JSON)
			.body(ApiError.of("surface." + e.field(), e.reason()));
	}

	@ExceptionHandler(NotFoundException.class)
	ResponseEntity<ApiError> notFound(NotFoundException e) {
		return ResponseEntity.status(HttpStatus.NOT_FOUND)
			.contentType(MediaType.APPLICATION_JSON)
			.body(ApiError.of("id", e.getMessage()));
	}

	@ExceptionHandler(MethodArgumentTypeMismatchException.class)
	ResponseEntity<ApiError> badId(MethodArgumentTypeMismatchException e) {
		return ResponseEntity.badRequest()
			.contentType(MediaType.APPLICATION_JSON)
			.body(ApiError.of(e.getName(), "must be a whole number"));
	}

	/** Someone else changed or deleted the same surface at the same moment: read it again and retry. */
	@ExceptionHandler(ConcurrencyFailureException.class)
	ResponseEntity<ApiError> conflict(ConcurrencyFailureException e) {
		return ResponseEntity.status(HttpStatus.CONFLICT)
			.contentType(MediaType.APPLICATION_JSON)
			.body(ApiError.of("id", "the surface was changed or deleted by someone else at the same moment; read it again and retry"));
	}

	/** The database does not answer (within the pool's 3 s) or cannot store now (disk full): nothing saved; retry. */
	@ExceptionHandler({ DataAccessResourceFailureException.class, CannotCreateTransactionException.class,
			UncategorizedDataAccessException.class, TransactionSystemException.class })
	ResponseEntity<ApiError> unavailable(RuntimeException e) {
		log.warn("surface API: database not answering: {}", e.getMessage());
		return ResponseEntity.status(HttpStatus.SERVICE_UNAVAILABLE)
			.contentType(MediaType.APPLICATION_JSON)
			.header("Retry-After", "30")
			.body(ApiError.of("server", "the database is not answering; nothing was saved; try again shortly"));
	}

	/** Anything else is our fault, not the caller's: logged, answered without internals. */
	@ExceptionHandler(RuntimeException.class)
	ResponseEntity<ApiError> unexpected(RuntimeException e) {
		log.error("surface API failed", e);
		return ResponseEntity.status(HttpStatus.INTERNAL_SERVER_ERROR)
			.contentType(MediaType.APPLICATION_JSON)
			.body(ApiError.of("server", "the surface could not be saved or read; nothing half-saved is kept; the error is logged"));
	}

	record Listed(long id, String name, String category) {
	}

	/** A saved surface in the same field names as the request's {@code surface} object. */
	record SurfaceJson(long id, String name, String category, String product, double waterPct, double proteinPct,
			double fatPct, double reducingSugarPct, double sucrosePct, double starchPct, double fibrePct,
			double ashPct, double asparagineMgPerKg, double surfaceWaterGPerM2, double thicknessMm,
			@JsonProperty("pH") Double ph, double bicarbonateGPerKg, double acidGPerKg, double initialTemperatureC,
			String notes, Instant updatedAt) {

		static SurfaceJson of(SavedSurface s) {
			return new SurfaceJson(s.getId(), s.getName(), s.getCategory(), s.getProduct(), s.getWaterPct(),
					s.getProteinPct(), s.getFatPct(), s.getReducingSugarPct(), s.getSucrosePct(), s.getStarchPct(),
					s.getFibrePct(), s.getAshPct(), s.getAsparagineMgPerKg(), s.getSurfaceWaterGPerM2(),
					s.getThicknessMm(), s.getPh(), s.getBicarbonateGPerKg(), s.getAcidGPerKg(),
					s.getInitialTemperatureC(), s.getNotes(), s.getUpdatedAt());
		}

	}

}

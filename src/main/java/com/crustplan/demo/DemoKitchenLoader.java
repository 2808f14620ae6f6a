package com.crustplan.demo;

import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import jakarta.validation.ConstraintViolation;
import jakarta.validation.Validator;

import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.boot.ApplicationArguments;
import org.springframework.boot.ApplicationRunner;
import org.springframework.boot.autoconfigure.condition.ConditionalOnProperty;
import org.springframework.core.io.ClassPathResource;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.stereotype.Component;
import org.springframework.transaction.support.TransactionTemplate;

import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.plan.PlanInputs;
import com.crustplan.plan.PlanReport;
import com.crustplan.plan.PlanService;
import com.crustplan.plan.PlanStep;
import com.crustplan.plan.SavedPlanService;
import com.crustplan.setup.SavedSetup;
import com.crustplan.setup.SetupForm;
import com.crustplan.setup.SetupService;
import com.crustplan.surface.SavedSurface;
import com.crustplan.surface.SurfaceForm;
import com.crustplan.system.TemperatureUnit;
import com.crustplan.surface.SurfaceService;
import com.crustplan.user.UserAccount;
import com.crustplan.user.UserAccountRepository;

import tools.jackson.core.JacksonException;
import tools.jackson.dataformat.yaml.YAMLMapper;

/**
 * Loads the invented demo kitchen (templates-demo/kitchen.yaml) into an empty database,
 * with demo accounts whose passwords the sign-in page shows. Every entry goes through the
 * same form validation and engine checks as a cook's input; a bad entry stops the load
 * with the entry and field named, and nothing of it is saved (one transaction).
 */
@Component
@ConditionalOnProperty(name = "crustplan.demo.enabled", havingValue = "true")
class DemoKitchenLoader implements ApplicationRunner {

	static final String FILE = "templates-demo/kitchen.yaml";

	record DemoKitchen(String kitchen, List<SurfaceForm> surfaces, List<SetupForm> setups, List<DemoPlan> plans) {
	}

	/**
	 * A saved plan in steps: names of the surface and setups above; temperatures in °C.
	 */
	record DemoPlan(String name, String surface, String targetStage, Double coreTargetC, Double horizonMinutes,
			List<DemoStep> steps) {
	}

	/**
	 * A step: a setup's name, or {@code rest} (the air's °C); it ends after minutes, at a
	 * stage or a core °C.
	 */
	record DemoStep(String setup, Double rest, Double minutes, String stage, Double coreC) {
	}

	private static final Logger log = LoggerFactory.getLogger(DemoKitchenLoader.class);

	private final SurfaceService surfaces;

	private final SetupService setups;

	private final UserAccountRepository users;

	private final PasswordEncoder encoder;

	private final Validator validator;

	private final TransactionTemplate tx;

	private final PlanService planner;

	private final SavedPlanService plans;

	DemoKitchenLoader(SurfaceService surfaces, SetupService setups, UserAccountRepository users,
			PasswordEncoder encoder, Validator validator, TransactionTemplate tx, PlanService planner,
			SavedPlanService plans) {
		this.surfaces = surfaces;
		this.setups = setups;
		this.planner = planner;
		this.plans = plans;
		this.users = users;
		this.encoder = encoder;
		this.validator = validator;
		this.tx = tx;
	}

	@Override
	public void run(ApplicationArguments args) {
		tx.executeWithoutResult(status -> {
			for (DemoAccounts.DemoAccount a : DemoAccounts.ALL) {
				if (!users.existsByUsernameIgnoreCase(a.username())) {
					users.save(new UserAccount(a.username(), encoder.encode(a.password()), a.role()));
				}
			}
			if (surfaces.count() > 0 || !setups.all().isEmpty()) {
				return;
			}
			DemoKitchen k = read();
			for (int i = 0; i < k.surfaces().size(); i++) {
				SurfaceForm f = k.surfaces().get(i);
				check("surfaces[" + i + "] (" + f.name() + ")", validator.validate(f));
				try {
					surfaces.create(f);
				}
				catch (InvalidInputException e) {
					throw new IllegalStateException(FILE + ": surfaces[" + i + "] " + e.getMessage(), e);
				}
			}
			for (int i = 0; i < k.setups().size(); i++) {
				SetupForm f = k.setups().get(i);
				check("setups[" + i + "] (" + f.name() + ")", validator.validate(f));
				try {
					setups.create(f);
				}
				catch (InvalidInputException e) {
					throw new IllegalStateException(FILE + ": setups[" + i + "] " + e.getMessage(), e);
				}
			}
			List<DemoPlan> demoPlans = k.plans() == null ? List.of() : k.plans();
			for (int i = 0; i < demoPlans.size(); i++) {
				savePlan(demoPlans.get(i), "plans[" + i + "] (" + demoPlans.get(i).name() + ")");
			}
			log.info("Demo kitchen '{}' loaded: {} surfaces, {} setups, {} plans", k.kitchen(), k.surfaces().size(),
					k.setups().size(), demoPlans.size());
		});
	}

	/**
	 * Runs a demo plan like a cook's and saves it; a step or name the kitchen lacks stops
	 * the load.
	 */
	private void savePlan(DemoPlan p, String where) {
		SavedSurface surface = surfaces.all()
			.stream()
			.filter(s -> s.getName().equals(p.surface()))
			.findFirst()
			.orElseThrow(() -> new IllegalStateException(FILE + ": " + where + " no surface '" + p.surface() + "'"));
		List<PlanStep> steps = new ArrayList<>();
		List<String> names = new ArrayList<>();
		SetupForm first = null;
		for (DemoStep d : p.steps()) {
			if (d.setup() == null) {
				steps.add(new PlanStep(null, null, d.rest(), d.minutes(), d.stage(), null, d.coreC()));
				names.add("Rest");
				continue;
			}
			SavedSetup setup = setups.all()
				.stream()
				.filter(s -> s.getName().equals(d.setup()))
				.findFirst()
				.orElseThrow(() -> new IllegalStateException(FILE + ": " + where + " no setup '" + d.setup() + "'"));
			SetupForm f = SetupForm.of(setup, TemperatureUnit.CELSIUS);
			first = first == null ? f : first;
			steps.add(new PlanStep(f, setup.getName(), null, d.minutes(), d.stage(), null, d.coreC()));
			names.add(setup.getName());
		}
		PlanInputs inputs = new PlanInputs(SurfaceForm.of(surface, TemperatureUnit.CELSIUS), first, p.targetStage(),
				null, p.horizonMinutes() == null ? PlanService.DEFAULT_HORIZON_MINUTES : p.horizonMinutes(), steps,
				p.coreTargetC());
		try {
			PlanReport report = planner.plan(inputs);
			plans.save(p.name(), surface.getName(), String.join(" → ", names), inputs, report, null);
		}
		catch (InvalidInputException e) {
			throw new IllegalStateException(FILE + ": " + where + " " + e.getMessage(), e);
		}
	}

	static DemoKitchen read() {
		try (InputStream in = new ClassPathResource(FILE).getInputStream()) {
			DemoKitchen k = YAMLMapper.builder().build().readValue(in, DemoKitchen.class);
			if (k == null || k.surfaces() == null || k.setups() == null) {
				throw new IllegalStateException(FILE + ": needs 'surfaces' and 'setups' lists");
			}
			return k;
		}
		catch (IOException | JacksonException e) {
			throw new IllegalStateException(FILE + " cannot be read: " + e.getMessage(), e);
		}
	}

	private static <T> void check(String where, Set<ConstraintViolation<T>> violations) {
		if (!violations.isEmpty()) {
			ConstraintViolation<T> v = violations.iterator().next();
			throw new IllegalStateException(FILE + ": " + where + " " + v.getPropertyPath() + " " + v.getMessage());
		}
	}

}

package com.crustplan.plan;

import java.util.List;

import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

import com.crustplan.system.MessageText;
import com.crustplan.system.NotFoundException;
import com.crustplan.system.StaleEditException;
import com.crustplan.system.TemperatureUnit;

import tools.jackson.databind.json.JsonMapper;

/**
 * Saved plans; a save is one transaction of one row, so it is there whole or not at all.
 */
@Service
public class SavedPlanService {

	private final SavedPlanRepository plans;

	private final JsonMapper json;

	private final MessageText text;

	SavedPlanService(SavedPlanRepository plans, JsonMapper json, MessageText text) {
		this.plans = plans;
		this.json = json;
		this.text = text;
	}

	@Transactional
	public SavedPlan save(String name, String surfaceName, String setupName, PlanInputs inputs, PlanReport report,
			String username) {
		SavedPlan plan = new SavedPlan(name.trim(), surfaceName, setupName, label(report), json(inputs),
				report.reached(), report.timeToTargetS(), username);
		plan.summarise(report);
		return plans.save(plan);
	}

	/**
	 * An edit of a saved plan: new inputs and figures under the same id; refused as stale
	 * when someone else changed it since {@code expectedVersion}.
	 */
	@Transactional
	public SavedPlan update(long id, Integer expectedVersion, String name, String surfaceName, String setupName,
			PlanInputs inputs, PlanReport report) {
		SavedPlan plan = get(id);
		if (expectedVersion != null && expectedVersion != plan.getVersion()) {
			throw new StaleEditException("Plan", id);
		}
		plan.replace(name.trim(), surfaceName, setupName, label(report), json(inputs), report);
		return plans.save(plan);
	}

	/** Keeps today's figures for the list after a re-run against today's model. */
	@Transactional
	public SavedPlan summarise(long id, PlanReport report) {
		SavedPlan plan = get(id);
		plan.summarise(report);
		return plans.save(plan);
	}

	private String json(PlanInputs inputs) {
		// steps hold their setups' values in °C already (PlanStepsForm copies them so)
		PlanInputs celsius = new PlanInputs(inputs.surface().inUnit(TemperatureUnit.CELSIUS),
				inputs.setup() == null ? null : inputs.setup().inUnit(TemperatureUnit.CELSIUS), inputs.targetStage(),
				inputs.targetLightness(), inputs.horizonMinutes(), inputs.steps(), inputs.coreTargetC(),
				inputs.changes());
		return json.writeValueAsString(celsius);
	}

	/**
	 * The target as text for the list; a target is a stage or an L*, never a temperature,
	 * so a core-only target is named without the figure (it would be in °C).
	 */
	private String label(PlanReport report) {
		return "target.core".equals(report.targetLabel().code()) ? "Core temperature"
				: text.celsius(report.targetLabel());
	}

	@Transactional(readOnly = true)
	public SavedPlan get(long id) {
		return plans.findById(id).orElseThrow(() -> new NotFoundException("Plan", id));
	}

	public PlanInputs inputs(SavedPlan plan) {
		return json.readValue(plan.getInputsJson(), PlanInputs.class);
	}

	@Transactional(readOnly = true)
	public List<SavedPlan> all() {
		return plans.findAllByOrderByCreatedAtDesc();
	}

	@Transactional
	public void delete(long id) {
		plans.delete(plans.findById(id).orElseThrow(() -> new NotFoundException("Plan", id)));
	}

}

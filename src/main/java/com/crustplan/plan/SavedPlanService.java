package com.crustplan.plan;

import java.util.List;

import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

import com.crustplan.system.MessageText;
import com.crustplan.system.NotFoundException;
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
		// steps hold their setups' values in °C already (PlanStepsForm copies them so)
		PlanInputs celsius = new PlanInputs(inputs.surface().inUnit(TemperatureUnit.CELSIUS),
				inputs.setup() == null ? null : inputs.setup().inUnit(TemperatureUnit.CELSIUS), inputs.targetStage(),
				inputs.targetLightness(), inputs.horizonMinutes(), inputs.steps(), inputs.coreTargetC());
		// the label is kept as text for the list of plans; a target is a stage or an L*,
		// never a temperature
		// a core-only target would be a temperature in °C: the list names it without the
		// figure
		String label = "target.core".equals(report.targetLabel().code()) ? "Core temperature"
				: text.celsius(report.targetLabel());
		return plans.save(new SavedPlan(name.trim(), surfaceName, setupName, label, json.writeValueAsString(celsius),
				report.reached(), report.timeToTargetS(), username));
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

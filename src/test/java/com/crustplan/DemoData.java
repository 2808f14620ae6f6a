package com.crustplan;

import org.springframework.stereotype.Component;

import com.crustplan.plan.SavedPlanRepository;
import com.crustplan.setup.SetupRepository;
import com.crustplan.surface.SurfaceRepository;

/** Finds the demo kitchen's records by name, so tests do not depend on generated ids. */
@Component
public class DemoData {

	private final SurfaceRepository surfaces;

	private final SetupRepository setups;

	private final SavedPlanRepository plans;

	DemoData(SurfaceRepository surfaces, SetupRepository setups, SavedPlanRepository plans) {
		this.surfaces = surfaces;
		this.setups = setups;
		this.plans = plans;
	}

	public long plan(String name) {
		return plans.findAll().stream().filter(p -> p.getName().equals(name)).findFirst().orElseThrow().getId();
	}

	public long surface(String name) {
		return surfaces.findAll().stream().filter(s -> s.getName().equals(name)).findFirst().orElseThrow().getId();
	}

	public long setup(String name) {
		return setups.findAll().stream().filter(s -> s.getName().equals(name)).findFirst().orElseThrow().getId();
	}

}

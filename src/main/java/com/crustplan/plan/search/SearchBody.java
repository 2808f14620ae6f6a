package com.crustplan.plan.search;

import java.util.List;

import com.crustplan.plan.PlanBody;
import com.crustplan.surface.SurfaceBody;

/**
 * A {@code POST /api/v1/plans/search} body: the surface (inline as the plans API takes
 * it, or a saved one's {@code surfaceId}), the equipment ({@code heat}, as the plans API;
 * its temperature is the range's), the range of settings to try, the target and the time.
 */
record SearchBody(SurfaceBody surface, Long surfaceId, PlanBody.HeatBody heat, RangeBody range,
		PlanBody.TargetBody target, Double withinMinutes, Boolean underBenchmark) {

	/**
	 * Set temperatures {@code fromC} to {@code toC} by {@code stepC}; an oven may try
	 * several {@code steamPct} values.
	 */
	record RangeBody(Double fromC, Double toC, Double stepC, List<Double> steamPct) {
	}

}

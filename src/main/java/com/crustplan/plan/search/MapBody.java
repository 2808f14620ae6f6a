package com.crustplan.plan.search;

import com.crustplan.plan.PlanBody;
import com.crustplan.surface.SurfaceBody;

/**
 * A {@code POST /api/v1/maps} body: surface, equipment and range as a search takes them;
 * the map's columns every {@code stepMinutes} up to {@code minutes}; an optional colour
 * target marks where each row reaches it.
 */
record MapBody(SurfaceBody surface, Long surfaceId, PlanBody.HeatBody heat, SearchBody.RangeBody range,
		PlanBody.TargetBody target, Double minutes, Double stepMinutes) {
}

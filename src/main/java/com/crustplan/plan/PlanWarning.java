package com.crustplan.plan;

/** Something about this plan a cook should act on, with a stable code for the API. */
public record PlanWarning(String code, String message) {
}

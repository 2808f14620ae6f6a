package com.crustplan.plan;

import com.crustplan.engine.message.Message;

/** Something about this plan a cook should act on, with a stable code for the API. */
public record PlanWarning(String code, Message message) {
}

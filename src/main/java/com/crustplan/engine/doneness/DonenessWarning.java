package com.crustplan.engine.doneness;

import com.crustplan.engine.message.Message;

/**
 * One doneness warning: a stable code for the API and what to tell the cook, the reason
 * followed by a suggestion that changes the outcome.
 */
public record DonenessWarning(String code, Message message) {
}

package com.crustplan.user;

/**
 * An account's role, state or password changed: whatever was granted on the old terms
 * must go. {@code oldPasswordHash} is the hash stored before the change.
 */
public record AccountChanged(String username, String oldPasswordHash) {
}

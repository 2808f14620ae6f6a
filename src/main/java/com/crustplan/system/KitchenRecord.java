package com.crustplan.system;

import java.time.Instant;

import jakarta.persistence.Column;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.MappedSuperclass;
import jakarta.persistence.Version;

/**
 * What every named record of the kitchen has: an id, an optimistic-locking version, a
 * name, notes and when it was created and last changed.
 */
@MappedSuperclass
public abstract class KitchenRecord {

	@Id
	@GeneratedValue(strategy = GenerationType.IDENTITY)
	private Long id;

	@Version
	private int version;

	@Column(nullable = false, length = 80)
	private String name;

	@Column(length = 1000)
	private String notes;

	@Column(name = "created_at", nullable = false)
	private Instant createdAt = Instant.now();

	@Column(name = "updated_at", nullable = false)
	private Instant updatedAt;

	/**
	 * Sets the name and notes as a cook typed them (trimmed; blank notes become none) and
	 * stamps the change.
	 */
	protected void rename(String newName, String newNotes) {
		name = newName.trim();
		notes = newNotes == null || newNotes.isBlank() ? null : newNotes.trim();
		updatedAt = Instant.now();
	}

	public Long getId() {
		return id;
	}

	/**
	 * The optimistic-locking version: edit forms carry it, so a save from a stale form is
	 * refused.
	 */
	public int getVersion() {
		return version;
	}

	public String getName() {
		return name;
	}

	public String getNotes() {
		return notes;
	}

	public Instant getCreatedAt() {
		return createdAt;
	}

	public Instant getUpdatedAt() {
		return updatedAt;
	}

}

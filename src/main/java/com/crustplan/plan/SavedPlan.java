package com.crustplan.plan;

import java.time.Instant;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;

/** A plan the kitchen named and kept: its inputs as JSON and a summary for lists. */
@Entity
@Table(name = "saved_plan")
public class SavedPlan {

	/**
	 * The column's length (Flyway V4): fits the inputs' JSON even when every text is
	 * escaped at its longest.
	 */
	static final int INPUTS_MAX = 20000;

	@Id
	@GeneratedValue(strategy = GenerationType.IDENTITY)
	private Long id;

	@Version
	private int version;

	@Column(nullable = false, length = 120)
	private String name;

	@Column(name = "surface_name", nullable = false, length = 80)
	private String surfaceName;

	@Column(name = "setup_name", nullable = false, length = 80)
	private String setupName;

	@Column(name = "target_label", nullable = false, length = 80)
	private String targetLabel;

	@Column(name = "inputs_json", nullable = false, length = SavedPlan.INPUTS_MAX)
	private String inputsJson;

	@Column(nullable = false)
	private boolean reached;

	@Column(name = "time_to_target_s")
	private Double timeToTargetS;

	@Column(name = "created_by", length = 60)
	private String createdBy;

	@Column(name = "created_at", nullable = false)
	private Instant createdAt;

	protected SavedPlan() {
	}

	public SavedPlan(String name, String surfaceName, String setupName, String targetLabel, String inputsJson,
			boolean reached, Double timeToTargetS, String createdBy) {
		this.name = name;
		this.surfaceName = surfaceName;
		this.setupName = setupName;
		this.targetLabel = targetLabel;
		this.inputsJson = inputsJson;
		this.reached = reached;
		this.timeToTargetS = timeToTargetS;
		this.createdBy = createdBy;
		this.createdAt = Instant.now();
	}

	public Long getId() {
		return id;
	}

	public String getName() {
		return name;
	}

	public String getSurfaceName() {
		return surfaceName;
	}

	public String getSetupName() {
		return setupName;
	}

	public String getTargetLabel() {
		return targetLabel;
	}

	public String getInputsJson() {
		return inputsJson;
	}

	public boolean isReached() {
		return reached;
	}

	public Double getTimeToTargetS() {
		return timeToTargetS;
	}

	public String getCreatedBy() {
		return createdBy;
	}

	public Instant getCreatedAt() {
		return createdAt;
	}

}

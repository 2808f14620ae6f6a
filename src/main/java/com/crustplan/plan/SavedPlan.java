package com.crustplan.plan;

import java.time.Instant;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;

import com.crustplan.engine.assessment.AcrylamideZone;

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

	@Column(name = "core_at_target_c")
	private Double coreAtTargetC;

	@Column(name = "portion_acrylamide_ug_per_kg")
	private Double portionAcrylamideUgPerKg;

	/** low, elevated or high; null where no benchmark applies. */
	@Column(name = "acrylamide_zone", length = 16)
	private String acrylamideZone;

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

	/**
	 * The figures the list shows, from a run of the model (at saving, or a re-run against
	 * today's model).
	 */
	void summarise(PlanReport report) {
		this.reached = report.reached();
		this.timeToTargetS = report.timeToTargetS();
		this.coreAtTargetC = report.coreTemperatureAtTargetC();
		AcrylamideView a = report.acrylamideMatters() ? report.acrylamide() : null;
		this.portionAcrylamideUgPerKg = a == null ? null : a.portionUgPerKg();
		this.acrylamideZone = a == null ? null : a.zone();
	}

	/** New inputs from an edit, with their figures. */
	void replace(String name, String surfaceName, String setupName, String targetLabel, String inputsJson,
			PlanReport report) {
		this.name = name;
		this.surfaceName = surfaceName;
		this.setupName = setupName;
		this.targetLabel = targetLabel;
		this.inputsJson = inputsJson;
		summarise(report);
	}

	public Double getCoreAtTargetC() {
		return coreAtTargetC;
	}

	public Double getPortionAcrylamideUgPerKg() {
		return portionAcrylamideUgPerKg;
	}

	public String getAcrylamideZone() {
		return acrylamideZone;
	}

	/** The zone in the words the plan page uses; null where there is none. */
	public String getZoneLabel() {
		if (acrylamideZone == null) {
			return null;
		}
		return switch (acrylamideZone) {
			case "low" -> AcrylamideZone.LOW.label();
			case "elevated" -> AcrylamideZone.ELEVATED.label();
			case "high" -> AcrylamideZone.HIGH.label();
			default -> null;
		};
	}

	public int getVersion() {
		return version;
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

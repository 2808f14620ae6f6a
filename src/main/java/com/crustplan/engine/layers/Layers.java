package com.crustplan.engine.layers;

/**
 * Read-only view of the state of every control volume during a run, handed to reactions
 * that work layer by layer (acrylamide). Values are live: they change as the run
 * advances.
 */
public interface Layers {

	Grid grid();

	int size();

	double temperatureK(int i);

	/** Moisture, kg water per kg dry matter. */
	double moisture(int i);

	double waterActivity(int i);

	/** Dry matter of the control volume per m² of face, kg/m². */
	double dryMass(int i);

	/** Time since the start, s. */
	double timeS();

}

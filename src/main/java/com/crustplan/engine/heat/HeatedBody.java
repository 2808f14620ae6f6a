package com.crustplan.engine.heat;

import com.crustplan.engine.model.Parameter;

/**
 * A pan, griddle plate or fryer's oil as one lumped mass (its Biot number is small: metal
 * or stirred oil), with a heat input and losses to the kitchen: m·c·dT/dt = P(T) − Q_food
 * − h·A(T − T_room) − ε·σ·A(T⁴ − T_room⁴). Its temperature is what the food's contact or
 * oil exchange sees; the cook tells it, after each step, how much heat the food took. One
 * instance per run (it holds state); stepped explicitly, which is stable and accurate
 * while the step is far shorter than m·c/(h·A), hours for a pan.
 */
public final class HeatedBody {

	/** How the heat input responds to the body's temperature. */
	public enum Control {

		/**
		 * A thermostat (fryer, induction hob, plancha): full power below the set
		 * temperature, tapering to none across a proportional band.
		 */
		THERMOSTAT,
		/**
		 * A flame left where the cook set it: the power that holds the empty pan at its
		 * set temperature, and no more when a load pulls it down.
		 */
		FIXED_INPUT

	}

	/**
	 * A thermostat's proportional band: a few kelvin in catering fryers and induction
	 * hobs; the recovery after a load barely depends on it.
	 */
	public static final Parameter THERMOSTAT_BAND = Parameter.assumption("ΔT_band",
			"proportional band of a fryer's or hob's thermostat", 5, "K",
			"a few kelvin in catering fryers and induction hobs (assumption); the recovery after a load barely depends on it");

	static final double THERMOSTAT_BAND_K = THERMOSTAT_BAND.value();

	private final double heatCapacity;

	private final double lossAreaM2;

	private final double emissivity;

	private final double maxPowerW;

	private final Control control;

	private final double setK;

	private final double roomK;

	private final double convection;

	/**
	 * Area of food in contact with the body per face that touches it, m² (NaN: from the
	 * load).
	 */
	private double foodAreaPerFaceM2;

	/**
	 * Food in a batch, kg, where the contact area follows from it (a fryer basket); NaN
	 * otherwise.
	 */
	private final double loadKg;

	private final double fixedPowerW;

	private double temperatureK;

	private double drawW;

	private double inputJ;

	private double toFoodJ;

	private double lossJ;

	/**
	 * @param heatCapacity m·c, J/K
	 * @param lossAreaM2 area losing heat to the kitchen, m²
	 * @param convection natural convection to kitchen air, W/(m²·K)
	 * @param foodAreaPerFaceM2 food area touching the body per food face, m² (a pan's
	 * food footprint), or NaN when it follows from the load
	 * @param loadKg food per batch, kg, when the area follows from it (NaN otherwise)
	 */
	public HeatedBody(double heatCapacity, double lossAreaM2, double emissivity, double convection, double maxPowerW,
			Control control, double setK, double roomK, double foodAreaPerFaceM2, double loadKg) {
		this.heatCapacity = heatCapacity;
		this.lossAreaM2 = lossAreaM2;
		this.emissivity = emissivity;
		this.convection = convection;
		this.maxPowerW = maxPowerW;
		this.control = control;
		this.setK = setK;
		this.roomK = roomK;
		this.foodAreaPerFaceM2 = foodAreaPerFaceM2;
		this.loadKg = loadKg;
		this.fixedPowerW = Math.min(maxPowerW, lossW(setK));
		this.temperatureK = setK; // preheated
	}

	/** Heat lost to the kitchen at a body temperature, W. */
	public double lossW(double t) {
		return lossAreaM2
				* (convection * (t - roomK) + emissivity * Radiation.SIGMA * (Math.pow(t, 4) - Math.pow(roomK, 4)));
	}

	/** The heat input at a body temperature, W. */
	public double powerW(double t) {
		return switch (control) {
			case THERMOSTAT -> maxPowerW * Math.max(0, Math.min(1, (setK - t) / THERMOSTAT_BAND_K));
			case FIXED_INPUT -> fixedPowerW;
		};
	}

	/**
	 * Tells the body how much food one face carries, kg per m² of face (for a slab: bulk
	 * density × thickness), so a load given in kilograms becomes a contact area.
	 */
	public void placeFood(double foodKgPerM2OfFace) {
		if (!Double.isNaN(loadKg)) {
			foodAreaPerFaceM2 = loadKg / foodKgPerM2OfFace;
		}
	}

	/** Food area touching the body per food face, m². */
	public double foodAreaPerFaceM2() {
		return foodAreaPerFaceM2;
	}

	public double temperatureK() {
		return temperatureK;
	}

	/** Adds what one food face drew in the step just taken, W per m² of that face. */
	public void draw(double heatFluxWPerM2) {
		drawW += heatFluxWPerM2 * foodAreaPerFaceM2;
	}

	/** Advances the body over a step of dt with what the food drew during it. */
	public void advance(double dt) {
		double p = powerW(temperatureK);
		double loss = lossW(temperatureK);
		inputJ += p * dt;
		toFoodJ += drawW * dt;
		lossJ += loss * dt;
		temperatureK += dt * (p - drawW - loss) / heatCapacity;
		drawW = 0;
	}

	/**
	 * Starts the body at another temperature than its set one (a pan not yet up to heat).
	 */
	public void preheatTo(double k) {
		temperatureK = k;
	}

	/** Heat put in by the burner or element so far, J. */
	public double inputJ() {
		return inputJ;
	}

	/** Heat the food took so far, J. */
	public double toFoodJ() {
		return toFoodJ;
	}

	/** Heat lost to the kitchen so far, J. */
	public double lossJ() {
		return lossJ;
	}

	/** m·c, J/K. */
	public double heatCapacity() {
		return heatCapacity;
	}

	public double setK() {
		return setK;
	}

}

package com.crustplan.engine.food;

import com.crustplan.engine.input.InvalidInputException;

/**
 * Proximate composition of a food in mass percent. Reducing sugars (glucose, fructose,
 * lactose, maltose) and sucrose are kept apart because only the first take part in
 * Maillard browning; what the named parts leave of 100 % is counted as other
 * carbohydrate.
 */
public record Composition(double waterPct, double proteinPct, double fatPct, double reducingSugarPct, double sucrosePct,
		double starchPct, double fibrePct, double ashPct) {

	public Composition {
		SurfaceField.WATER.check(waterPct);
		SurfaceField.PROTEIN.check(proteinPct);
		SurfaceField.FAT.check(fatPct);
		SurfaceField.REDUCING_SUGAR.check(reducingSugarPct);
		SurfaceField.SUCROSE.check(sucrosePct);
		SurfaceField.STARCH.check(starchPct);
		SurfaceField.FIBRE.check(fibrePct);
		SurfaceField.ASH.check(ashPct);
		double sum = waterPct + proteinPct + fatPct + reducingSugarPct + sucrosePct + starchPct + fibrePct + ashPct;
		// 0.05 percentage points of slack for rounding in typed-in compositions
		if (sum > 100.05) {
			throw new InvalidInputException("composition",
					String.format("the parts add up to %.2f %%, more than 100 %%", sum));
		}
		if (waterPct >= 100) {
			throw new InvalidInputException("waterPct", "a food needs some dry matter (water must be below 100 %)");
		}
	}

	public double totalPct() {
		return waterPct + proteinPct + fatPct + reducingSugarPct + sucrosePct + starchPct + fibrePct + ashPct;
	}

	/** What the named parts leave of 100 %, counted as other carbohydrate. */
	public double remainderPct() {
		return Math.max(0, 100 - totalPct());
	}

	public double dryMatterPct() {
		return 100 - waterPct;
	}

	/** Moisture on a dry basis, kg water per kg dry matter. */
	public double moistureDryBasis() {
		return waterPct / (100 - waterPct);
	}

	/**
	 * Mass fractions of the dry matter in the order of {@code FoodComponent} minus water:
	 * protein, fat, carbohydrate (sugars, starch and the remainder), fibre, ash.
	 */
	public double[] dryMatterFractions() {
		double dry = 100 - waterPct;
		double carbohydrate = reducingSugarPct + sucrosePct + starchPct + remainderPct();
		return new double[] { proteinPct / dry, fatPct / dry, carbohydrate / dry, fibrePct / dry, ashPct / dry };
	}

	public Composition withWaterPct(double newWaterPct) {
		return new Composition(newWaterPct, proteinPct, fatPct, reducingSugarPct, sucrosePct, starchPct, fibrePct,
				ashPct);
	}

	public Composition withReducingSugarPct(double pct) {
		return new Composition(waterPct, proteinPct, fatPct, pct, sucrosePct, starchPct, fibrePct, ashPct);
	}

	public Composition withSucrosePct(double pct) {
		return new Composition(waterPct, proteinPct, fatPct, reducingSugarPct, pct, starchPct, fibrePct, ashPct);
	}

	/**
	 * A composition by named parts, for tables of typical values; a part not named is 0
	 * %.
	 */
	public static final class Parts {

		private double water;

		private double protein;

		private double fat;

		private double reducingSugar;

		private double sucrose;

		private double starch;

		private double fibre;

		private double ash;

		public Parts water(double pct) {
			water = pct;
			return this;
		}

		public Parts protein(double pct) {
			protein = pct;
			return this;
		}

		public Parts fat(double pct) {
			fat = pct;
			return this;
		}

		public Parts reducingSugar(double pct) {
			reducingSugar = pct;
			return this;
		}

		public Parts sucrose(double pct) {
			sucrose = pct;
			return this;
		}

		public Parts starch(double pct) {
			starch = pct;
			return this;
		}

		public Parts fibre(double pct) {
			fibre = pct;
			return this;
		}

		public Parts ash(double pct) {
			ash = pct;
			return this;
		}

		public Composition build() {
			return new Composition(water, protein, fat, reducingSugar, sucrose, starch, fibre, ash);
		}

	}

}

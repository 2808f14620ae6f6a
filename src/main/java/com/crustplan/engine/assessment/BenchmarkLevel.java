package com.crustplan.engine.assessment;

/**
 * Benchmark levels for acrylamide, Commission Regulation (EU) 2017/2158, Annex IV, µg/kg.
 * A benchmark level is a performance indicator for the mitigation measures, not a legal
 * limit. Values as reproduced in published tables of Annex IV (quoted, evidence
 * "secondary"); check the Annex for the exact wording of each product description.
 */
public enum BenchmarkLevel {

	FRENCH_FRIES("French fries (ready-to-eat)", 500),
	POTATO_CRISPS(
			"Potato crisps from fresh potatoes and from potato dough; potato-based crackers; other potato products from potato dough",
			750),
	SOFT_BREAD_WHEAT("Soft bread, wheat-based", 50), SOFT_BREAD_OTHER("Soft bread other than wheat-based", 100),
	BREAKFAST_CEREALS_BRAN_WHOLEGRAIN(
			"Breakfast cereals (excluding porridge): bran products, whole grain cereals, gun-puffed grain", 300),
	BREAKFAST_CEREALS_WHEAT_RYE("Breakfast cereals (excluding porridge): wheat- and rye-based products", 300),
	BREAKFAST_CEREALS_MAIZE_OAT_SPELT_BARLEY_RICE(
			"Breakfast cereals (excluding porridge): maize, oat, spelt, barley and rice-based products", 150),
	BISCUITS_AND_WAFERS("Biscuits and wafers", 350), CRACKERS("Crackers, except potato-based crackers", 400),
	CRISPBREAD("Crispbread", 350), GINGERBREAD("Gingerbread", 800),
	SIMILAR_FINE_BAKERY(
			"Products similar to the other products in this category (biscuits, crackers, crispbread, gingerbread)",
			300),
	ROAST_COFFEE("Roast coffee", 400), INSTANT_COFFEE("Instant (soluble) coffee", 850),
	COFFEE_SUBSTITUTES_CEREALS("Coffee substitutes exclusively from cereals", 500),
	COFFEE_SUBSTITUTES_CHICORY("Coffee substitutes exclusively from chicory", 4000),
	BABY_FOODS_CEREAL_BASED(
			"Baby foods, processed cereal-based foods for infants and young children, excluding biscuits and rusks",
			40),
	BABY_BISCUITS_AND_RUSKS("Biscuits and rusks for infants and young children", 150);

	/** Where the values come from, shown beside the table. */
	public static final String SOURCE = "Commission Regulation (EU) 2017/2158 of 20 November 2017, Annex IV (values quoted from published reproductions of the Annex)";

	private final String product;

	private final double microgramsPerKg;

	BenchmarkLevel(String product, double microgramsPerKg) {
		this.product = product;
		this.microgramsPerKg = microgramsPerKg;
	}

	/** The product description of the Annex row. */
	public String product() {
		return product;
	}

	public double microgramsPerKg() {
		return microgramsPerKg;
	}

	/** The zone an estimate falls in against this benchmark. */
	public AcrylamideZone zoneOf(double ugPerKg) {
		return AcrylamideZone.of(ugPerKg, microgramsPerKg);
	}

}

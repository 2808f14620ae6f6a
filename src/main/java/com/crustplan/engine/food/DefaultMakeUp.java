package com.crustplan.engine.food;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import com.crustplan.engine.model.Evidence;
import com.crustplan.engine.model.Parameter;

/**
 * Where each category's default make-up (the composition and free asparagine a new
 * surface starts from, set in {@link FoodCategory}) comes from, for the model catalogue.
 * The numbers are read from the category, so the catalogue cannot drift from them.
 */
public final class DefaultMakeUp {

	private DefaultMakeUp() {
	}

	/** The source of a category's default composition, and how well it is known. */
	record Source(String text, Evidence evidence) {
	}

	static Source composition(FoodCategory c) {
		return switch (c) {
			case MEAT -> new Source("lean beef, typical values (from memory)", Evidence.FROM_MEMORY);
			case POULTRY_SKIN ->
				new Source("chicken with its skin, typical values (from memory)", Evidence.FROM_MEMORY);
			case FISH -> new Source("lean white fish, typical values (from memory)", Evidence.FROM_MEMORY);
			case POTATO -> new Source(
					"raw frying potato, typical values (from memory); its 21 % dry matter and 0.4 % reducing sugar meet the"
							+ " requirements for French-fry potatoes, dry matter above 20 % and reducing sugar up to 0.5 % of"
							+ " fresh weight (ICAR-Central Potato Research Institute, quality requirements of potatoes for"
							+ " processing), and lie within the retail range (Vivanti, Finotti & Friedman 2006, J Food Sci)",
					Evidence.FROM_MEMORY);
			case BREAD -> new Source("lean wheat dough, typical values (from memory)", Evidence.FROM_MEMORY);
			case SWEET_DOUGH -> new Source("enriched sweet dough, typical values (from memory)", Evidence.FROM_MEMORY);
			case VEGETABLE -> new Source("onion, typical values (from memory)", Evidence.FROM_MEMORY);
		};
	}

	static Source asparagine(FoodCategory c) {
		return switch (c) {
			case MEAT ->
				new Source("free asparagine of muscle is low, tens of mg/kg (from memory)", Evidence.FROM_MEMORY);
			case POULTRY_SKIN, FISH ->
				new Source("low, as for red meat; not measured (assumption)", Evidence.ASSUMPTION);
			case POTATO -> new Source(
					"22.7 mmol/kg, a point within the 1.2–58 mmol/kg of retail potatoes (Vivanti, Finotti & Friedman 2006,"
							+ " J Food Sci); the point is our choice (assumption)",
					Evidence.ASSUMPTION);
			case BREAD ->
				new Source("wheat flour 0.1–0.5 g/kg diluted by the dough's water (from memory)", Evidence.FROM_MEMORY);
			case SWEET_DOUGH -> new Source("a little below lean dough, the flour diluted by sugar and fat (assumption)",
					Evidence.ASSUMPTION);
			case VEGETABLE -> new Source("onion-like vegetable, not measured (assumption)", Evidence.ASSUMPTION);
		};
	}

	/** The category's default make-up as catalogue parameters, % by mass as eaten raw. */
	public static List<Parameter> parameters(FoodCategory c) {
		Composition k = c.defaultComposition();
		Source s = composition(c);
		List<Parameter> out = new ArrayList<>();
		String[] names = { "water", "protein", "fat", "reducing sugar", "sucrose", "starch", "fibre", "ash" };
		double[] values = { k.waterPct(), k.proteinPct(), k.fatPct(), k.reducingSugarPct(), k.sucrosePct(),
				k.starchPct(), k.fibrePct(), k.ashPct() };
		for (int i = 0; i < names.length; i++) {
			out.add(new Parameter(names[i] + "₀", String.format(Locale.ROOT, "default %s, %s", names[i], c.label()),
					values[i], "%", s.text(), s.evidence()));
		}
		Source a = asparagine(c);
		out.add(new Parameter("Asn₀", "default free asparagine, " + c.label(), c.defaultAsparagineMgPerKg(), "mg/kg",
				a.text(), a.evidence()));
		return out;
	}

}

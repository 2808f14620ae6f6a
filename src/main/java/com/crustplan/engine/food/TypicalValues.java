package com.crustplan.engine.food;

import java.util.ArrayList;
import java.util.List;

import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.Quantity;
import com.crustplan.engine.message.Text;
import com.crustplan.engine.model.Parameter;

/**
 * Whether a surface's acrylamide precursors lie near its category's typical values. The
 * estimate scales with asparagine times reducing sugar, so a value left over from another
 * category (50 mg/kg of meat's asparagine in a potato instead of about 3000) makes it
 * many times too low without any other sign.
 */
public final class TypicalValues {

	/**
	 * "Far" is more than this factor above or below the category's default. Assumption:
	 * the defaults are mid-range values, and within one category free asparagine and
	 * reducing sugar spread over about a factor of 3 either way (potato varieties and
	 * storage, flours); beyond 4 a value more likely belongs to another food or is a unit
	 * slip.
	 */
	public static final Parameter FAR_FACTOR = Parameter.assumption("F_typ",
			"factor off the category's typical precursor value that the surface page flags", 4, "–",
			"assumption: category defaults are mid-range; within a category free asparagine and reducing sugar spread about 3× either way (varieties, storage, flours), so beyond 4× a value more likely belongs to another food or is a unit slip");

	private TypicalValues() {
	}

	/**
	 * Messages for each precursor far from the category's typical value; empty when none
	 * is.
	 */
	public static List<Message> check(Surface s) {
		List<Message> out = new ArrayList<>();
		FoodCategory c = s.category();
		Text category = Text.of(c.label());
		double asn = s.asparagineMgPerKg();
		double asnTypical = c.defaultAsparagineMgPerKg();
		if (asn > asnTypical * FAR_FACTOR.value()) {
			out.add(Message.of("surface.asparagine-far-above", Quantity.of(asn, "mg/kg", 0),
					Quantity.of(asnTypical, "mg/kg", 0), category));
		}
		else if (asn < asnTypical / FAR_FACTOR.value()) {
			out.add(Message.of("surface.asparagine-far-below", Quantity.of(asn, "mg/kg", 0),
					Quantity.of(asnTypical, "mg/kg", 0), category));
		}
		double rs = s.composition().reducingSugarPct();
		double rsTypical = c.defaultComposition().reducingSugarPct();
		if (rs > rsTypical * FAR_FACTOR.value()) {
			out.add(Message.of("surface.sugar-far-above", Quantity.of(rs, "%", 2), Quantity.of(rsTypical, "%", 2),
					category));
		}
		else if (rs < rsTypical / FAR_FACTOR.value()) {
			out.add(Message.of("surface.sugar-far-below", Quantity.of(rs, "%", 2), Quantity.of(rsTypical, "%", 2),
					category));
		}
		return out;
	}

}

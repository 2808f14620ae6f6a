package com.crustplan.engine.myoglobin;

import java.util.ArrayList;
import java.util.List;

import com.crustplan.engine.colour.Lab;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.Quantity;
import com.crustplan.engine.model.Parameter;

/**
 * The inside of a muscle food at one moment, as a cook sees it on the cut face: each
 * layer's depth, share of pigment denatured, hottest temperature and colour; the crust at
 * each face (layers dried to {@link #CRUST_WATER_ACTIVITY}) in its browning colour; the
 * cooked band under it (layers past {@link PigmentKinetics#COOKED_LOOK}); and the centre.
 * <p>
 * A slab is heated on both faces (face 0 at depth 0, face 1 at the full thickness); a
 * strip or ball has one outside surface at depth 0 and its centre at the radius.
 *
 * @param lengthMm the grid's span: a slab's thickness, a round body's radius
 * @param crustMm dried crust at face 0 and face 1 (face 1 NaN for a round body)
 * @param bandMm cooked band under each face's crust, mm (face 1 NaN for a round body)
 * @param cookedThrough whether the centre itself looks cooked
 * @param centre the centre in the trade's words
 * @param band the bands in words
 */
public record InteriorProfile(FoodCategory category, int shape, double lengthMm, List<Layer> layers, double[] crustMm,
		Lab[] crustColour, double[] bandMm, boolean cookedThrough, double centreDenatured, double centrePeakC,
		Message centre, Message band, double atS) {

	/**
	 * A layer dried to this water activity or below is crust: browning needs a surface
	 * drier than the wet plateau (aw near 1), and a browned meat crust sits well below aw
	 * 0.9 (assumption; see the water activity factor of the browning model).
	 */
	public static final Parameter CRUST_WATER_ACTIVITY = Parameter.assumption("aw,crust",
			"water activity at or below which a layer is drawn as crust", 0.9, "–",
			"a layer that browns has dried off the wet plateau; the cut-off is our choice (assumption)");

	/** One node of the grid: depth from face 0, share denatured, hottest °C, colour. */
	public record Layer(double depthMm, double denatured, double peakC, Lab colour) {
	}

	public InteriorProfile {
		layers = List.copyOf(layers);
		crustMm = crustMm.clone();
		crustColour = crustColour.clone();
		bandMm = bandMm.clone();
	}

	static InteriorProfile of(FoodCategory category, PigmentKinetics kinetics, int shape, double lengthMm,
			double[] depthMm, double[] denatured, double[] peakC, double[] waterActivity, double extent0,
			double extent1, double atS) {
		int n = depthMm.length;
		double cooked = PigmentKinetics.COOKED_LOOK.value();
		List<Layer> layers = new ArrayList<>(n);
		for (int i = 0; i < n; i++) {
			layers.add(new Layer(depthMm[i], denatured[i], peakC[i], kinetics.colourAt(denatured[i])));
		}
		boolean slab = shape == 0;
		double centreMm = slab ? lengthMm / 2 : lengthMm;
		double centreDenatured = at(depthMm, denatured, centreMm);
		double centrePeak = at(depthMm, peakC, centreMm);
		double[] crust = { Double.NaN, Double.NaN };
		double[] band = { Double.NaN, Double.NaN };
		Lab[] crustColour = new Lab[2];
		for (int f = 0; f < (slab ? 2 : 1); f++) {
			double[] d = new double[n];
			double[] x = new double[n];
			double[] aw = new double[n];
			for (int k = 0; k < n; k++) {
				int i = f == 0 ? k : n - 1 - k;
				d[k] = denatured[i];
				x[k] = f == 0 ? depthMm[i] : lengthMm - depthMm[i];
				aw[k] = waterActivity[i];
			}
			crust[f] = crustDepth(x, aw, centreMm);
			double cookedTo = cookedDepth(x, d, cooked, centreMm);
			band[f] = Math.max(0, cookedTo - crust[f]);
			crustColour[f] = category.colourPath().colourAt(f == 0 ? extent0 : extent1);
		}
		boolean through = centreDenatured >= cooked;
		return new InteriorProfile(category, shape, lengthMm, layers, crust, crustColour, band, through,
				centreDenatured, centrePeak, CentreDoneness.describe(category, centrePeak),
				bandMessage(category, slab, through, band), atS);
	}

	/** Out to the edge of the last dried layer's control volume from the face. */
	private static double crustDepth(double[] x, double[] aw, double centreMm) {
		double depth = 0;
		for (int k = 0; k < x.length && x[k] <= centreMm; k++) {
			if (aw[k] > CRUST_WATER_ACTIVITY.value()) {
				break;
			}
			depth = k + 1 < x.length ? Math.min(centreMm, 0.5 * (x[k] + x[k + 1])) : x[k];
		}
		return depth;
	}

	/**
	 * Where the denatured share first falls below the cooked look, linear between layers.
	 */
	private static double cookedDepth(double[] x, double[] d, double cooked, double centreMm) {
		if (d[0] < cooked) {
			return 0;
		}
		for (int k = 1; k < x.length; k++) {
			if (d[k] < cooked) {
				double at = x[k - 1] + (x[k] - x[k - 1]) * (d[k - 1] - cooked) / (d[k - 1] - d[k]);
				return Math.min(at, centreMm);
			}
			if (x[k] >= centreMm) {
				break;
			}
		}
		return centreMm;
	}

	/** Linear interpolation of a field over increasing depths. */
	private static double at(double[] depth, double[] field, double x) {
		int n = depth.length;
		if (x <= depth[0]) {
			return field[0];
		}
		for (int i = 1; i < n; i++) {
			if (x <= depth[i]) {
				double w = (x - depth[i - 1]) / (depth[i] - depth[i - 1]);
				return field[i - 1] + w * (field[i] - field[i - 1]);
			}
		}
		return field[n - 1];
	}

	private static Message bandMessage(FoodCategory category, boolean slab, boolean through, double[] band) {
		String kind = category == FoodCategory.FISH ? "fish"
				: category == FoodCategory.POULTRY_SKIN ? "poultry" : "meat";
		if (through) {
			return switch (kind) {
				case "fish" -> Message.of("interior.through.fish");
				case "poultry" -> Message.of("interior.through.poultry");
				default -> Message.of("interior.through.meat");
			};
		}
		// a band the page would show as 0.0 mm is no band: an unturned steak's upper face
		// was never seared, and a face just laid in has none yet
		boolean upperBand = Math.round(band[0] * 10) > 0;
		boolean lowerBand = slab && Math.round(band[1] * 10) > 0;
		if (!upperBand && !lowerBand) {
			return switch (kind) {
				case "fish" -> Message.of("interior.band.fish.none");
				case "poultry" -> Message.of("interior.band.poultry.none");
				default -> Message.of("interior.band.meat.none");
			};
		}
		if (slab && upperBand != lowerBand) {
			// not named upper or lower: in a pan the face first down is face 0
			Quantity only = Quantity.of(upperBand ? band[0] : band[1], "mm", 1);
			return switch (kind) {
				case "fish" -> Message.of("interior.band.fish.one-face", only);
				case "poultry" -> Message.of("interior.band.poultry.one-face", only);
				default -> Message.of("interior.band.meat.one-face", only);
			};
		}
		Quantity upper = Quantity.of(band[0], "mm", 1);
		if (!slab || Math.round(band[0] * 10) == Math.round(band[1] * 10)) {
			return switch (kind) {
				case "fish" -> Message.of("interior.band.fish.even", upper);
				case "poultry" -> Message.of("interior.band.poultry.even", upper);
				default -> Message.of("interior.band.meat.even", upper);
			};
		}
		Quantity lower = Quantity.of(band[1], "mm", 1);
		return switch (kind) {
			case "fish" -> Message.of("interior.band.fish", upper, lower);
			case "poultry" -> Message.of("interior.band.poultry", upper, lower);
			default -> Message.of("interior.band.meat", upper, lower);
		};
	}

	/** The deeper of the two faces' cooked bands, mm. */
	public double deepestBandMm() {
		return Double.isNaN(bandMm[1]) ? bandMm[0] : Math.max(bandMm[0], bandMm[1]);
	}

	public boolean slab() {
		return shape == 0;
	}

}

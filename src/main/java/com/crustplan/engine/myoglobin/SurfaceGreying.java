package com.crustplan.engine.myoglobin;

import java.util.Arrays;

import com.crustplan.engine.colour.ColourPath;
import com.crustplan.engine.colour.Lab;
import com.crustplan.engine.food.FoodCategory;

/**
 * The colour of a red-meat surface, which greys before it browns. The first segment of
 * the meat colour path, raw red to grey, is the pigment denaturing at the face, not
 * Maillard browning: a steamed or poached face denatures fully while its browning extent
 * stays near zero, and must not be drawn raw. Below the path's first anchor the face
 * takes its own pigment's colour, blended into the path's grey as browning begins; from
 * there on the path rules. Poultry skin browns from pale skin, and the fish path already
 * starts near opaque white (drawn so on purpose), so both keep their paths.
 */
public final class SurfaceGreying {

	private SurfaceGreying() {
	}

	/** Whether a category's surface colour depends on its pigment before it browns. */
	public static boolean applies(FoodCategory category) {
		return category == FoodCategory.MEAT;
	}

	/**
	 * The face's colour from its browning extent and the share of its pigment denatured.
	 */
	public static Lab colour(FoodCategory category, double browningExtent, double faceDenatured) {
		ColourPath path = category.colourPath();
		if (!applies(category)) {
			return path.colourAt(browningExtent);
		}
		double grey = path.anchors().get(1).extent();
		if (browningExtent >= grey) {
			return path.colourAt(browningExtent);
		}
		Lab pigment = PigmentKinetics.forCategory(category).orElseThrow().colourAt(faceDenatured);
		return pigment.interpolate(path.colourAt(grey), browningExtent / grey);
	}

	/** The share of face 0's pigment denatured over a run, one entry per step. */
	public static final class FaceHistory {

		private double[] timeS = new double[1024];

		private double[] denatured = new double[1024];

		private int size;

		void add(double t, double f) {
			if (size == timeS.length) {
				timeS = Arrays.copyOf(timeS, 2 * size);
				denatured = Arrays.copyOf(denatured, 2 * size);
			}
			timeS[size] = t;
			denatured[size] = f;
			size++;
		}

		/** The share denatured at time t, linear between steps (0 before the first). */
		public double at(double t) {
			if (size == 0 || t <= timeS[0]) {
				return size == 0 || t < timeS[0] ? 0 : denatured[0];
			}
			int i = Arrays.binarySearch(timeS, 0, size, t);
			if (i >= 0) {
				return denatured[i];
			}
			int hi = -i - 1;
			if (hi >= size) {
				return denatured[size - 1];
			}
			double w = (t - timeS[hi - 1]) / (timeS[hi] - timeS[hi - 1]);
			return denatured[hi - 1] + w * (denatured[hi] - denatured[hi - 1]);
		}

	}

}

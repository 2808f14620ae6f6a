package com.crustplan.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import com.crustplan.engine.myoglobin.InteriorProfile;
import com.crustplan.engine.myoglobin.InteriorProfile.Layer;

/**
 * The cut face of a piece of meat, poultry or fish as the plan page draws it: to scale in
 * millimetres (the SVG's own units), crust, cooked band and centre in their predicted
 * colours. A slab is drawn as a section {@link #SLAB_WIDTH_MM} wide; a strip or ball as
 * its round section, rings from the surface in.
 *
 * @param stripes a slab's layers, top (face 0) to bottom, as horizontal bands
 * @param rings a round body's layers, outside in, as filled circles drawn in order
 */
public record CutFace(InteriorProfile profile, double widthMm, double heightMm, List<Stripe> stripes,
		List<Ring> rings) {

	/**
	 * Width of the slab drawn: a steak's cut face is a few centimetres across (a drawing
	 * choice; only the thickness and the bands come from the model).
	 */
	static final double SLAB_WIDTH_MM = 60;

	public record Stripe(double yMm, double heightMm, String hex) {

		/** SVG attribute values, in mm to the micrometre. */
		public String y() {
			return svg(yMm);
		}

		public String height() {
			return svg(heightMm);
		}

	}

	public record Ring(double radiusMm, String hex) {

		public String r() {
			return svg(radiusMm);
		}

	}

	static String svg(double mm) {
		return String.format(Locale.ROOT, "%.3f", mm);
	}

	/** The SVG view box: the section and a strip below it for the scale bar, mm. */
	public String viewBox() {
		return "0 0 " + svg(widthMm) + " " + svg(heightMm + strip());
	}

	public String width() {
		return svg(widthMm);
	}

	public String centre() {
		return svg(widthMm / 2);
	}

	/** Top of the scale bar, mm. */
	public String scaleY() {
		return svg(heightMm + strip() / 2);
	}

	public String scaleTextY() {
		return svg(heightMm + strip() * (1 - 0.5 / SCALE_STRIP_MM));
	}

	/**
	 * Size of the scale's label, mm in the drawing: the same on the page at every size.
	 */
	public String scaleFontSize() {
		return svg(strip() * 2.6 / SCALE_STRIP_MM);
	}

	public String scaleStroke() {
		return svg(strip() * 0.4 / SCALE_STRIP_MM);
	}

	/**
	 * Room under the section for the scale bar, mm: a tenth of the drawing's width, so
	 * that the bar's label reads the same on a small ball as on a wide steak.
	 */
	private double strip() {
		return SCALE_STRIP_MM * widthMm / SLAB_WIDTH_MM;
	}

	public String scaleBar() {
		return svg(scaleBarMm());
	}

	/**
	 * Room under the section for the scale bar of a drawing {@link #SLAB_WIDTH_MM} wide,
	 * mm.
	 */
	static final double SCALE_STRIP_MM = 6;

	public CutFace {
		stripes = List.copyOf(stripes);
		rings = List.copyOf(rings);
	}

	/** The drawing of a profile, or null where there is none. */
	static CutFace of(InteriorProfile p) {
		if (p == null) {
			return null;
		}
		List<Layer> layers = p.layers();
		int n = layers.size();
		double length = p.lengthMm();
		List<Stripe> stripes = new ArrayList<>();
		List<Ring> rings = new ArrayList<>();
		if (p.slab()) {
			for (int i = 0; i < n; i++) {
				double top = i == 0 ? 0 : 0.5 * (layers.get(i - 1).depthMm() + layers.get(i).depthMm());
				double bottom = i == n - 1 ? length : 0.5 * (layers.get(i).depthMm() + layers.get(i + 1).depthMm());
				stripes.add(new Stripe(top, bottom - top, layers.get(i).colour().hex()));
			}
			for (int f = 0; f < 2; f++) {
				double crust = p.crustMm()[f];
				if (crust > 0) {
					stripes.add(new Stripe(f == 0 ? 0 : length - crust, crust, p.crustColour()[f].hex()));
				}
			}
			return new CutFace(p, Math.max(SLAB_WIDTH_MM, 2 * length), length, stripes, rings);
		}
		double crust = p.crustMm()[0];
		if (crust > 0) {
			rings.add(new Ring(length, p.crustColour()[0].hex()));
		}
		for (int i = 0; i < n; i++) {
			double outer = i == 0 ? 0 : 0.5 * (layers.get(i - 1).depthMm() + layers.get(i).depthMm());
			double r = length - Math.max(outer, crust);
			if (r > 0) {
				rings.add(new Ring(r, layers.get(i).colour().hex()));
			}
		}
		return new CutFace(p, 2 * length, 2 * length, stripes, rings);
	}

	/** Whether the section is round (a strip or ball) rather than a slab. */
	public boolean round() {
		return !profile.slab();
	}

	/** Cooked band under the crust of face 0 (the upper face), mm. */
	public double upperBandMm() {
		return profile.bandMm()[0];
	}

	/** Cooked band under the crust of face 1, mm (null for a round body). */
	public Double lowerBandMm() {
		return PlanReport.finite(profile.bandMm()[1]);
	}

	public double upperCrustMm() {
		return profile.crustMm()[0];
	}

	/** Crust of face 1, mm (null for a round body). */
	public Double lowerCrustMm() {
		return round() ? null : PlanReport.finite(profile.crustMm()[1]);
	}

	/** The colour of face 0's crust, or null where it formed none. */
	public String crustHex() {
		return profile.crustMm()[0] > 0 ? profile.crustColour()[0].hex() : null;
	}

	/**
	 * The colour halfway through face 0's cooked band, or null where there is none (the
	 * key beside the drawing).
	 */
	public String bandHex() {
		double band = profile.bandMm()[0];
		if (!(band > 0)) {
			return null;
		}
		double depth = profile.crustMm()[0] + band / 2;
		Layer best = profile.layers().get(0);
		for (Layer l : profile.layers()) {
			if (Math.abs(l.depthMm() - depth) < Math.abs(best.depthMm() - depth)) {
				best = l;
			}
		}
		return best.colour().hex();
	}

	/** Thickness of the piece as drawn (a round body's diameter), mm. */
	public double sizeMm() {
		return round() ? 2 * profile.lengthMm() : profile.lengthMm();
	}

	/** The centre's colour. */
	public String centreHex() {
		Layer centre = centreLayer();
		return centre.colour().hex();
	}

	private Layer centreLayer() {
		List<Layer> layers = profile.layers();
		if (round()) {
			return layers.get(layers.size() - 1);
		}
		double mid = profile.lengthMm() / 2;
		Layer best = layers.get(0);
		for (Layer l : layers) {
			if (Math.abs(l.depthMm() - mid) < Math.abs(best.depthMm() - mid)) {
				best = l;
			}
		}
		return best;
	}

	/** Share of the centre's pigment denatured, %. */
	public double centreDenaturedPct() {
		return 100 * profile.centreDenatured();
	}

	/** A 10 mm scale bar, or 5 mm on small pieces. */
	public double scaleBarMm() {
		return round() ? (widthMm < 16 ? 5 : 10) : heightMm < 12 ? 5 : 10;
	}

}

package com.crustplan.engine.colour;

import java.util.List;

import java.util.ArrayList;
import java.util.Locale;

import com.crustplan.engine.model.Evidence;
import com.crustplan.engine.model.Parameter;

/**
 * The colour a category's surface takes as its browning extent runs from 0 to 1: a
 * polyline through L*a*b* anchor colours at given extents. Colour paths need not be
 * monotone in L* (raw red meat lightens as it greys before it browns), which is why
 * targets are resolved to an extent.
 */
public final class ColourPath {

	public record Anchor(double extent, Lab colour) {
	}

	private final List<Anchor> anchors;

	private final String source;

	private final Evidence evidence;

	/**
	 * @param evidence how well the anchor colours are known (catalogued with the model)
	 */
	public ColourPath(List<Anchor> anchors, String source, Evidence evidence) {
		if (anchors.size() < 2 || anchors.get(0).extent() != 0 || anchors.get(anchors.size() - 1).extent() != 1) {
			throw new IllegalArgumentException("a colour path needs anchors at extent 0 and 1");
		}
		for (int i = 1; i < anchors.size(); i++) {
			if (anchors.get(i).extent() <= anchors.get(i - 1).extent()) {
				throw new IllegalArgumentException("anchor extents must increase");
			}
		}
		this.anchors = List.copyOf(anchors);
		this.source = source;
		this.evidence = evidence;
	}

	public static ColourPath of(Evidence evidence, String source, double[][] extentLab) {
		Anchor[] a = new Anchor[extentLab.length];
		for (int i = 0; i < extentLab.length; i++) {
			a[i] = new Anchor(extentLab[i][0], new Lab(extentLab[i][1], extentLab[i][2], extentLab[i][3]));
		}
		return new ColourPath(List.of(a), source, evidence);
	}

	public Evidence evidence() {
		return evidence;
	}

	/**
	 * The anchors as catalogue parameters, one each: its L*, with the extent, a* and b*
	 * in the description, labelled as the path is.
	 * @param what what the path colours ("Red meat surface"), and what its extent means
	 */
	public List<Parameter> anchorParameters(String what, String extentName) {
		List<Parameter> out = new ArrayList<>();
		for (Anchor a : anchors) {
			out.add(new Parameter(
					"L*(" + a.extent() + ")", String.format(Locale.ROOT, "%s at %s %.2f: L* (a* %.1f, b* %.1f)", what,
							extentName, a.extent(), a.colour().a(), a.colour().b()),
					a.colour().lightness(), "L*", source, evidence));
		}
		return out;
	}

	public List<Anchor> anchors() {
		return anchors;
	}

	public String source() {
		return source;
	}

	public Lab colourAt(double extent) {
		double e = Math.max(0, Math.min(1, extent));
		for (int i = 1; i < anchors.size(); i++) {
			Anchor hi = anchors.get(i);
			if (e <= hi.extent()) {
				Anchor lo = anchors.get(i - 1);
				return lo.colour().interpolate(hi.colour(), (e - lo.extent()) / (hi.extent() - lo.extent()));
			}
		}
		return anchors.get(anchors.size() - 1).colour();
	}

	public double lightnessAt(double extent) {
		return colourAt(extent).lightness();
	}

	/** Extent at which L* is highest: beyond it the path only darkens. */
	public double extentOfPalest() {
		Anchor best = anchors.get(0);
		for (Anchor a : anchors) {
			if (a.colour().lightness() > best.colour().lightness()) {
				best = a;
			}
		}
		return best.extent();
	}

	/**
	 * The extent at which the surface first darkens to L* = {@code lightness} after its
	 * palest point, or NaN if the path never gets that dark (or the target is paler than
	 * the path's palest colour).
	 */
	public double extentAtLightness(double lightness) {
		double start = extentOfPalest();
		for (int i = 1; i < anchors.size(); i++) {
			Anchor lo = anchors.get(i - 1);
			Anchor hi = anchors.get(i);
			if (hi.extent() <= start) {
				continue;
			}
			double l0 = lo.colour().lightness();
			double l1 = hi.colour().lightness();
			if (l1 < l0 && lightness <= l0 && lightness >= l1) {
				return lo.extent() + (hi.extent() - lo.extent()) * (l0 - lightness) / (l0 - l1);
			}
		}
		return Double.NaN;
	}

	public double darkestLightness() {
		double min = Double.MAX_VALUE;
		for (Anchor a : anchors) {
			min = Math.min(min, a.colour().lightness());
		}
		return min;
	}

	public double palestLightness() {
		return colourAt(extentOfPalest()).lightness();
	}

}

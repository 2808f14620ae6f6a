package com.crustplan.engine.layers;

/**
 * A vertex-centred finite-volume grid through the thickness: node 0 on face 0, node n−1
 * on face 1, each node owning the control volume between the midpoints to its neighbours
 * (half volumes at the faces, so a face node is the surface layer). Nodes crowd towards
 * both faces, where the gradients are, by blending uniform and cosine spacing.
 */
public final class Grid {

	/**
	 * Weight of cosine spacing in the blend: 0 uniform, 1 Chebyshev–Lobatto (our choice;
	 * see the convergence table).
	 */
	public static final double DEFAULT_CLUSTERING = 0.7;

	private final double[] position;

	private final double[] width;

	private final double thickness;

	public Grid(double thicknessM, int nodes, double clustering) {
		if (nodes < 3) {
			throw new IllegalArgumentException("at least 3 nodes");
		}
		if (!(thicknessM > 0)) {
			throw new IllegalArgumentException("thickness must be positive");
		}
		this.thickness = thicknessM;
		position = new double[nodes];
		width = new double[nodes];
		int last = nodes - 1;
		for (int i = 0; i < nodes; i++) {
			double u = (double) i / last;
			double cosine = 0.5 * (1 - Math.cos(Math.PI * u));
			position[i] = thicknessM * ((1 - clustering) * u + clustering * cosine);
		}
		position[0] = 0;
		position[last] = thicknessM;
		for (int i = 0; i < nodes; i++) {
			double left = i == 0 ? 0 : 0.5 * (position[i] + position[i - 1]);
			double right = i == last ? thicknessM : 0.5 * (position[i] + position[i + 1]);
			width[i] = right - left;
		}
	}

	public static Grid uniform(double thicknessM, int nodes) {
		return new Grid(thicknessM, nodes, 0);
	}

	public int size() {
		return position.length;
	}

	public double position(int i) {
		return position[i];
	}

	/** Width of node i's control volume, m. */
	public double width(int i) {
		return width[i];
	}

	/** Distance between node i and node i+1, m. */
	public double spacing(int i) {
		return position[i + 1] - position[i];
	}

	public double thickness() {
		return thickness;
	}

	/** Linear interpolation of a nodal field at depth x. */
	public double interpolate(double[] field, double x) {
		int n = position.length;
		if (x <= 0) {
			return field[0];
		}
		if (x >= thickness) {
			return field[n - 1];
		}
		int lo = 0;
		int hi = n - 1;
		while (hi - lo > 1) {
			int mid = (lo + hi) >>> 1;
			if (position[mid] <= x) {
				lo = mid;
			}
			else {
				hi = mid;
			}
		}
		double f = (x - position[lo]) / (position[hi] - position[lo]);
		return field[lo] + f * (field[hi] - field[lo]);
	}

}

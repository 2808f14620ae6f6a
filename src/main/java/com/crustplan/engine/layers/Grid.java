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

	/** Area of the interface between node i and i+1 per unit of outside face. */
	private final double[] area;

	private final int shape;

	public Grid(double thicknessM, int nodes, double clustering) {
		this(thicknessM, nodes, clustering, 0);
	}

	/**
	 * A grid for a body of shape factor m: 0 a slab of the given thickness (node 0 and
	 * node n−1 both faces), 1 an infinite cylinder and 2 a sphere of the given radius,
	 * node 0 on the outside surface and node n−1 on the centre (a symmetry point, no
	 * flux). Interface areas go as r^m and volumes as r^(m+1)/(m+1), both per unit of
	 * outside surface, so every capacity and conductance stays "per m² of face".
	 */
	public Grid(double thicknessM, int nodes, double clustering, int shape) {
		if (shape < 0 || shape > 2) {
			throw new IllegalArgumentException("shape factor must be 0, 1 or 2");
		}
		this.shape = shape;
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
		area = new double[nodes];
		for (int i = 0; i < nodes; i++) {
			area[i] = 1;
		}
		if (shape > 0) {
			// depth x from the surface is radius r = R − x; volume per unit outside area
			// is (r_out^(m+1) − r_in^(m+1)) / ((m+1)·R^m)
			double r = thicknessM;
			for (int i = 0; i < nodes; i++) {
				double left = i == 0 ? 0 : 0.5 * (position[i] + position[i - 1]);
				double right = i == last ? thicknessM : 0.5 * (position[i] + position[i + 1]);
				double outer = (r - left) / r;
				double inner = (r - right) / r;
				width[i] = r * (Math.pow(outer, shape + 1) - Math.pow(inner, shape + 1)) / (shape + 1);
				if (i < last) {
					area[i] = Math.pow(inner, shape);
				}
			}
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

	/**
	 * Area of the interface between node i and i+1 per unit of outside face: 1 for a
	 * slab.
	 */
	public double faceArea(int i) {
		return area[i];
	}

	/** Shape factor: 0 slab, 1 cylinder, 2 sphere. */
	public int shape() {
		return shape;
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

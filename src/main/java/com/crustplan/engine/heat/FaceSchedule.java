package com.crustplan.engine.heat;

/**
 * Which boundary condition each face sees at a time (a pan or grill flip swaps the
 * faces).
 */
public interface FaceSchedule {

	FaceExchange at(int face, double timeS);

	/**
	 * True if the face is the heated one at this time (for reporting the browned face).
	 */
	boolean heated(int face, double timeS);

	/**
	 * The next time after {@code timeS} at which the faces' conditions change (a flip);
	 * +∞ if never.
	 */
	default double nextChangeAfter(double timeS) {
		return Double.POSITIVE_INFINITY;
	}

	/** Flip-free setups in which both faces see the same heat. */
	boolean symmetric();

	/**
	 * The heated body (pan, oil) of this setup, if it has one whose temperature moves;
	 * null otherwise.
	 */
	default HeatedBody body() {
		return null;
	}

	/**
	 * A schedule that swaps a heated and an open exchange every {@code flipEverySeconds}
	 * (0: never).
	 */
	static FaceSchedule flipping(FaceExchange heated, FaceExchange open, double flipEverySeconds) {
		return new FaceSchedule() {
			private boolean down(int face, double t) {
				boolean flipped = flipEverySeconds > 0 && ((long) Math.floor(t / flipEverySeconds)) % 2 == 1;
				return (face == 0) != flipped;
			}

			@Override
			public FaceExchange at(int face, double timeS) {
				return down(face, timeS) ? heated : open;
			}

			@Override
			public boolean heated(int face, double timeS) {
				return down(face, timeS);
			}

			@Override
			public double nextChangeAfter(double timeS) {
				return flipEverySeconds > 0 ? (Math.floor(timeS / flipEverySeconds) + 1) * flipEverySeconds
						: Double.POSITIVE_INFINITY;
			}

			@Override
			public boolean symmetric() {
				return false;
			}

			@Override
			public HeatedBody body() {
				return heated.body();
			}
		};
	}

	static FaceSchedule both(FaceExchange exchange) {
		return new FaceSchedule() {
			@Override
			public FaceExchange at(int face, double timeS) {
				return exchange;
			}

			@Override
			public boolean heated(int face, double timeS) {
				return true;
			}

			@Override
			public boolean symmetric() {
				return true;
			}

			@Override
			public HeatedBody body() {
				return exchange.body();
			}
		};
	}

}

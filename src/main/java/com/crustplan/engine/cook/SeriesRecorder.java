package com.crustplan.engine.cook;

import java.util.ArrayList;
import java.util.List;

import com.crustplan.engine.colour.ColourPath;

/**
 * Records a {@link Sample} at the start, at every output time and at the end: the series
 * the charts draw.
 */
final class SeriesRecorder implements StepListener {

	private final ColourPath path;

	private final double intervalS;

	private final List<Sample> series = new ArrayList<>();

	private double nextOutputS;

	SeriesRecorder(ColourPath path, double intervalS) {
		this.path = path;
		this.intervalS = intervalS;
		this.nextOutputS = intervalS;
	}

	@Override
	public void init(CookState state, StepInterpolator step) {
		series.add(sample(state, step.current()));
	}

	@Override
	public void handleStep(CookState state, StepInterpolator step) {
		if (state.time >= nextOutputS - 1e-9) {
			series.add(sample(state, step.current()));
			nextOutputS += intervalS;
		}
	}

	@Override
	public void finish(CookState state, StepInterpolator step) {
		if (series.get(series.size() - 1).timeS() < state.time - 1e-9) {
			series.add(sample(state, step.current()));
		}
	}

	@Override
	public double nextCheckpointS() {
		return nextOutputS;
	}

	List<Sample> series() {
		return series;
	}

	private Sample sample(CookState s, Moment m) {
		double extent = s.browningExtent(0);
		return new Sample(s.time, s.surfaceK() - 273.15, s.otherFaceK() - 273.15, m.coreK() - 273.15,
				s.faceWaterActivity(0), s.moisture(0), s.standingWater(0) * 1000, extent, path.colourAt(extent),
				m.crustLevel(), m.portionLevel(), m.heatSourceK() - 273.15);
	}

}

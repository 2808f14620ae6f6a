package com.crustplan.engine.catalogue;

import com.crustplan.engine.model.Equation;
import com.crustplan.engine.model.Evidence;
import com.crustplan.engine.model.ModelSection;
import com.crustplan.engine.model.Parameter;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * Renders the model catalogue as Markdown for the contributor guide. A test keeps the
 * block in DEVELOPERS.md equal to this output, so the guide cannot drift from the
 * constants.
 */
public final class ModelDocument {

	public static final String BEGIN = "<!-- model:begin (generated from ModelCatalogue; do not edit by hand) -->";

	public static final String END = "<!-- model:end -->";

	private ModelDocument() {
	}

	public static String markdown(List<ModelSection> sections) {
		StringBuilder md = new StringBuilder();
		evidenceCounts(sections, md);
		for (ModelSection s : sections) {
			md.append("### ").append(s.title()).append("\n\n");
			for (Equation e : s.equations()) {
				md.append("**").append(e.title()).append("** — `").append(e.formula()).append("`  \n");
				md.append(e.explanation()).append("\n\n");
				if (!e.parameters().isEmpty()) {
					md.append("| symbol | meaning | value | unit | source | evidence |\n|---|---|---|---|---|---|\n");
					for (Parameter p : e.parameters()) {
						md.append("| ")
							.append(p.symbol())
							.append(" | ")
							.append(p.description())
							.append(" | ")
							.append(format(p.value()))
							.append(" | ")
							.append(p.unit())
							.append(" | ")
							.append(p.source().replace("|", "/"))
							.append(" | ")
							.append(p.evidence().label())
							.append(" |\n");
					}
					md.append('\n');
				}
			}
			if (!s.limits().isEmpty()) {
				md.append("Known limits:\n\n");
				for (String l : s.limits()) {
					md.append("- ").append(l).append('\n');
				}
				md.append('\n');
			}
		}
		return md.toString();
	}

	/**
	 * How many catalogued parameters carry each evidence label, each counted once: the
	 * model's constants apart from the colour anchors (surface and cut face) and the
	 * default make-up, which are many and mostly from memory.
	 */
	private static void evidenceCounts(List<ModelSection> sections, StringBuilder md) {
		Set<Parameter> constants = new LinkedHashSet<>();
		Set<Parameter> colour = new LinkedHashSet<>();
		Set<Parameter> makeUp = new LinkedHashSet<>();
		Set<Parameter> all = new LinkedHashSet<>();
		for (ModelSection s : sections) {
			boolean defaults = s.title().startsWith("Default make-up");
			for (Equation e : s.equations()) {
				for (Parameter p : e.parameters()) {
					// colour paths list their anchors as L* parameters
					(defaults ? makeUp : "L*".equals(p.unit()) ? colour : constants).add(p);
					all.add(p);
				}
			}
		}
		md.append("### Evidence behind the numbers\n\n");
		md.append(
				"Parameters by evidence label, each counted once (a value shared by several categories with the same source is one parameter).\n\n");
		md.append("| evidence | model constants | colour anchors | default make-up | all |\n|---|---|---|---|---|\n");
		List<Set<Parameter>> groups = new ArrayList<>(List.of(constants, colour, makeUp, all));
		for (Evidence ev : Evidence.values()) {
			md.append("| ").append(ev.label());
			for (Set<Parameter> g : groups) {
				md.append(" | ").append(g.stream().filter(p -> p.evidence() == ev).count());
			}
			md.append(" |\n");
		}
		md.append("| **total**");
		for (Set<Parameter> g : groups) {
			md.append(" | ").append(g.size());
		}
		md.append(" |\n\n");
	}

	/**
	 * A number as a reader wants it: up to 5 significant digits, no exponent for ordinary
	 * sizes.
	 */
	public static String format(double v) {
		if (v == Math.rint(v) && Math.abs(v) < 1e7) {
			return String.format(Locale.ROOT, "%d", (long) v);
		}
		double a = Math.abs(v);
		if (a >= 1e-3 && a < 1e6) {
			return String.format(Locale.ROOT, "%.5g", v).replaceAll("0+$", "").replaceAll("\\.$", "");
		}
		return String.format(Locale.ROOT, "%.4e", v)
			.replace("e", "×10^")
			.replace("×10^+0", "×10^")
			.replace("×10^+", "×10^")
			.replace("×10^-0", "×10^-");
	}

}

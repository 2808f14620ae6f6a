package com.crustplan.plan;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import java.util.function.Function;

/**
 * A small least-recently-used cache of finished plan reports. A report is a pure function
 * of its inputs and of the model, and the model is the code of this process, so a deploy
 * of a new model starts with an empty cache; the key also carries the build's version to
 * make that explicit. Two requests missing the same key at once both compute it: wasted
 * work, never a wrong answer.
 */
final class ReportCache<K, V> {

	/**
	 * Reports kept: the demo kitchen has a few dozen surface × setup pairs; a report with
	 * its series is about 100 kB, so 128 stay within about 13 MB of heap (calibrated to
	 * the demo plans).
	 */
	static final int PLAN_REPORTS = 128;

	/**
	 * The build that computed the reports (jar manifest; "dev" when run from classes).
	 */
	static final String MODEL_VERSION = Objects
		.requireNonNullElse(ReportCache.class.getPackage().getImplementationVersion(), "dev");

	private record Entry<K>(K key, String modelVersion) {
	}

	private final Map<Entry<K>, V> entries;

	ReportCache(int size) {
		this.entries = new LinkedHashMap<>(size * 2, 0.75f, true) {
			@Override
			protected boolean removeEldestEntry(Map.Entry<Entry<K>, V> eldest) {
				return size() > size;
			}
		};
	}

	V get(K key, Function<K, V> compute) {
		Entry<K> e = new Entry<>(key, MODEL_VERSION);
		synchronized (entries) {
			V hit = entries.get(e);
			if (hit != null) {
				return hit;
			}
		}
		// computed outside the lock: a slow plan never holds up the others
		V v = compute.apply(key);
		synchronized (entries) {
			entries.put(e, v);
		}
		return v;
	}

	int size() {
		synchronized (entries) {
			return entries.size();
		}
	}

}

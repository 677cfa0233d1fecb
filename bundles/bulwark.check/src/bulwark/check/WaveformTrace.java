package bulwark.check;

import bulwark.check.cases.SolvedCycle;

/**
 * One part's voltage and current over the steady cycle of a waveform case — the part the case stresses most
 * — resampled for plots at {@link #SAMPLES} evenly spaced instants, linearly between the solved points (the
 * solver's own steps crowd where the waveform turns fast). Every judged figure comes from the solved points,
 * never from these samples.
 */
public record WaveformTrace(String caseName, String part, String method, double[] seconds, double[] volts,
		double[] amps) {
	public static final int SAMPLES = 120;

	/** The part's trace over the cycle. */
	static WaveformTrace of(String caseName, String part, SolvedCycle cycle) {
		int n = cycle.points().size();
		double[] ts = new double[n], vs = new double[n], is = new double[n];
		for (int k = 0; k < n; k++) {
			var point = cycle.points().get(k).device(part);
			ts[k] = cycle.seconds().get(k);
			vs[k] = point.voltage();
			is[k] = point.current();
		}
		double end = ts[n - 1];
		double[] t = new double[SAMPLES], v = new double[SAMPLES], i = new double[SAMPLES];
		int segment = 0;
		for (int k = 0; k < SAMPLES; k++) {
			t[k] = end * k / (SAMPLES - 1);
			while (segment < n - 2 && ts[segment + 1] < t[k]) {
				segment++;
			}
			double span = ts[Math.min(segment + 1, n - 1)] - ts[segment];
			double w = span > 0 ? Math.min(1, Math.max(0, (t[k] - ts[segment]) / span)) : 0;
			int next = Math.min(segment + 1, n - 1);
			v[k] = vs[segment] + w * (vs[next] - vs[segment]);
			i[k] = is[segment] + w * (is[next] - is[segment]);
		}
		return new WaveformTrace(caseName, part, cycle.method(), t, v, i);
	}
}

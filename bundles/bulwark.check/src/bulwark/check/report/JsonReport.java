package bulwark.check.report;

import java.io.IOException;
import java.io.Writer;
import java.util.List;

import com.google.gson.stream.JsonWriter;

import bulwark.check.cases.CaseResult;
import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.finding.FindingDetail;
import bulwark.check.cases.PartStress;
import bulwark.check.WaveformTrace;
import bulwark.check.WorstStress;
import bulwark.check.fix.Fix;
import bulwark.check.fix.TextEdit;
import bulwark.check.function.FunctionFigures;
import bulwark.check.function.PairFigures;

/**
 * The machine-readable result. Its field names are a contract for every later consumer: fields may be added,
 * never renamed. Every number is in SI units; a number that is not finite is written as null.
 */
public final class JsonReport {
	private JsonReport() {
	}

	public static void write(List<DesignResult> results, String version, String caution, Writer out)
			throws IOException {
		write(results, version, caution, (r, f) -> List.of(), out);
	}

	/** @param fixes the verified fixes of a finding of a design (an empty list when none or not computed) */
	public static void write(List<DesignResult> results, String version, String caution,
			java.util.function.BiFunction<DesignResult, Finding, List<Fix>> fixes, Writer out) throws IOException {
		JsonWriter w = new JsonWriter(out);
		w.setIndent("  ");
		w.beginObject();
		w.name("tool").beginObject().name("name").value("bulwark").name("version").value(version).endObject();
		w.name("caution").value(caution);
		w.name("designs").beginArray();
		for (DesignResult r : results) {
			design(w, r, fixes);
		}
		w.endArray();
		w.endObject();
		w.flush();
		out.write('\n');
		out.flush();
	}

	private static void design(JsonWriter w, DesignResult r,
			java.util.function.BiFunction<DesignResult, Finding, List<Fix>> fixes) throws IOException {
		w.beginObject();
		w.name("file").value(r.file());
		w.name("title").value(r.title());
		w.name("status").value(r.status().id());
		w.name("policy").value(r.policy());
		w.name("findings").beginArray();
		for (Finding f : r.findings()) {
			w.beginObject();
			w.name("rule").value(f.rule().text());
			w.name("concern").value(f.concern().id());
			w.name("severity").value(f.severity().id());
			w.name("message").value(f.message());
			w.name("part").value(f.part());
			w.name("case").value(f.caseName());
			w.name("line").value(f.location().line());
			w.name("column").value(f.location().column());
			number(w.name("value"), f.value());
			number(w.name("limit"), f.limit());
			w.name("unit").value(f.unit());
			if (f.rating() != null) {
				w.name("rating").value(f.rating());
			}
			detail(w, f);
			w.name("waived").value(f.waived());
			w.name("fixes").beginArray();
			for (Fix fix : fixes.apply(r, f)) {
				fix(w, fix);
			}
			w.endArray();
			w.endObject();
		}
		w.endArray();
		w.name("cases").beginArray();
		for (CaseResult c : r.cases()) {
			w.beginObject();
			w.name("name").value(c.name());
			w.name("kind").value(c.kind());
			w.name("converged").value(c.converged());
			w.name("parts").beginArray();
			for (PartStress p : c.parts()) {
				w.beginObject();
				w.name("part").value(p.part());
				number(w.name("voltage"), p.voltage());
				number(w.name("current"), p.current());
				number(w.name("power"), p.power());
				number(w.name("utilisation"), p.utilisation());
				w.name("limiting").value(p.limiting());
				w.endObject();
			}
			w.endArray();
			w.endObject();
		}
		w.endArray();
		w.name("stresses").beginArray();
		for (WorstStress s : r.stresses()) {
			w.beginObject();
			w.name("part").value(s.part());
			w.name("rating").value(s.rating());
			w.name("stress").value(s.what());
			number(w.name("value"), s.value());
			w.name("unit").value(s.unit());
			w.name("case").value(s.caseName());
			number(w.name("rated"), s.rated());
			number(w.name("derating"), s.factor());
			number(w.name("limit"), s.limit());
			number(w.name("utilisation"), s.utilisation());
			w.endObject();
		}
		w.endArray();
		function(w, r.function());
		// each waveform case's most stressed part over the steady cycle: seconds from the cycle's start, volts
		// across the part (its first pin against its second), amperes into its first pin
		w.name("waveforms").beginArray();
		for (WaveformTrace t : r.waveforms()) {
			w.beginObject();
			w.name("case").value(t.caseName());
			w.name("part").value(t.part());
			w.name("method").value(t.method());
			series(w.name("seconds"), t.seconds());
			series(w.name("volts"), t.volts());
			series(w.name("amps"), t.amps());
			w.endObject();
		}
		w.endArray();
		w.endObject();
	}

	private static void series(JsonWriter w, double[] values) throws IOException {
		w.beginArray();
		for (double v : values) {
			number(w, v);
		}
		w.endArray();
	}

	private static void fix(JsonWriter w, Fix fix) throws IOException {
		w.beginObject();
		w.name("label").value(fix.label());
		for (String side : new String[] { "before", "after" }) {
			w.name(side).beginObject();
			for (var e : (side.equals("before") ? fix.before() : fix.after()).entrySet()) {
				number(w.name(e.getKey()), e.getValue());
			}
			w.endObject();
		}
		w.name("edits").beginArray();
		for (TextEdit e : fix.edits()) {
			w.beginObject().name("line").value(e.line()).name("column").value(e.column()).name("offset").value(e.offset())
					.name("length").value(e.length()).name("text").value(e.text()).endObject();
		}
		w.endArray();
		w.endObject();
	}

	private static void function(JsonWriter w, FunctionFigures f) throws IOException {
		w.name("function").beginObject();
		w.name("indicator").value(f.indicator());
		number(w.name("standby_current"), f.standbyAmps());
		number(w.name("battery_life_hours"), f.batteryLifeHours());
		w.name("pairs").beginArray();
		for (PairFigures p : f.pairs()) {
			w.beginObject();
			w.name("from").value(p.from());
			w.name("to").value(p.to());
			w.name("on_when_shorted").value(p.onWhenShorted());
			number(w.name("threshold"), p.thresholdOhms());
			number(w.name("switch_rising"), p.risingOhms());
			number(w.name("switch_falling"), p.fallingOhms());
			number(w.name("hysteresis"), p.hysteresisOhms());
			number(w.name("test_current"), p.testCurrentAmps());
			number(w.name("open_voltage"), p.openVolts());
			number(w.name("shorted_battery_current"), p.shortedBatteryAmps());
			// a DC voltage across the pair, "from" positive, then "to" positive: where the indicator comes on
			// as it rises and goes off as it falls back
			number(w.name("switch_on_voltage"), p.forward().onVolts());
			number(w.name("switch_off_voltage"), p.forward().offVolts());
			number(w.name("switch_on_voltage_reversed"), p.reverse().onVolts());
			number(w.name("switch_off_voltage_reversed"), p.reverse().offVolts());
			for (String direction : new String[] { "rising", "falling" }) {
				w.name("sweep_" + direction).beginArray();
				for (var point : direction.equals("rising") ? p.rising() : p.falling()) {
					w.beginObject();
					number(w.name("ohms"), point.ohms());
					number(w.name("current"), point.amps());
					w.name("on").value(point.on());
					w.endObject();
				}
				w.endArray();
			}
			w.name("lights_leds").beginArray();
			for (String colour : p.lightsLeds()) {
				w.value(colour);
			}
			w.endArray();
			w.endObject();
		}
		w.endArray();
		w.name("comparators").beginArray();
		for (var c : f.comparators().entrySet()) {
			w.beginObject().name("part").value(c.getKey());
			var result = c.getValue().result();
			number(w.name("hysteresis_input"), result.map(x -> x.inputStepVolts()).orElse(null));
			number(w.name("hysteresis_terminals"), result.map(x -> x.hysteresisOhms()).orElse(null));
			w.name("between").value(result.map(x -> x.from() + "–" + x.to()).orElse(null));
			w.endObject();
		}
		w.endArray();
		w.name("problems").beginArray();
		for (String problem : f.problems()) {
			w.value(problem);
		}
		w.endArray();
		w.endObject();
	}

	private static void number(JsonWriter w, Double v) throws IOException {
		if (v == null || !Double.isFinite(v)) {
			w.nullValue();
		} else {
			w.value(v);
		}
	}

	/** A finding's structured detail, for tools that must not parse the message. */
	private static void detail(JsonWriter w, Finding f) throws IOException {
		if (f.detail() instanceof FindingDetail.ReversePath path) {
			w.name("path").beginArray();
			for (String step : path.steps()) {
				w.value(step);
			}
			w.endArray();
		} else if (f.detail() instanceof FindingDetail.MissingRatings missing) {
			w.name("missing").beginArray();
			for (FindingDetail.Missing m : missing.missing()) {
				w.beginObject().name("rating").value(m.rating()).name("rule").value(m.rule().text()).endObject();
			}
			w.endArray();
		} else if (f.detail() instanceof FindingDetail.SingleFault fault) {
			w.name("singleFault").beginObject().name("part").value(fault.part()).name("mode").value(fault.mode());
			w.name("consequences").beginArray();
			for (FindingDetail.Consequence c : fault.consequences()) {
				w.beginObject().name("case").value(c.caseName());
				if (c.unsolved() != null) {
					w.name("unsolved").value(c.unsolved());
				} else {
					w.name("part").value(c.part()).name("rating").value(c.rating());
					number(w.name("value"), c.value());
					number(w.name("rated"), c.rated());
					w.name("unit").value(c.unit());
				}
				w.endObject();
			}
			w.endArray().endObject();
		}
	}
}

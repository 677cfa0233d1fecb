package bulwark.check.faults;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import bulwark.check.compile.CompiledDesign;
import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Device;
import bulwark.engine.circuit.Resistor;
import bulwark.lang.design.Part;

/**
 * A design with one part failed: a short is 1 Ω between the pins it joins, an open part a gigaohm across each
 * of its pins (so that the nets it leaves keep a path the solver can see, as an open fuse does) [common
 * practice: far below and far above every other resistance of an input stage]. Not lower: a milliohm beside
 * the picosiemens across each junction at rest left a net joined only through the short and a junction
 * without a usable pivot, a failure of the arithmetic, not of the design. The failed part leaves the design's
 * parts: it is no longer what its text describes, and nothing judges it.
 */
public final class FaultInjector {
	/** A shorted part or pin pair, Ω. */
	public static final double SHORT_OHMS = 1;
	/** An open part, Ω [the same gap as an open fuse: 1 nA at 1 V]. */
	public static final double OPEN_OHMS = 1e9;

	private FaultInjector() {
	}

	public static CompiledDesign apply(CompiledDesign design, Fault fault) {
		Circuit circuit = design.circuit();
		int index = circuit.deviceIndex(fault.part());
		if (index < 0) {
			throw new IllegalArgumentException("no device " + fault.part() + " to fail");
		}
		Device d = circuit.devices().get(index);
		int[] p = d.pins();
		String name = fault.part();
		List<Device> extra = new ArrayList<>();
		Device replacement;
		switch (fault.mode()) {
		case SHORT:
			replacement = new Resistor(name, p[0], p[1], SHORT_OHMS);
			break;
		case OPEN:
			replacement = new Resistor(name, p[0], p[1], OPEN_OHMS);
			for (int k = 2; k < p.length; k++) {
				extra.add(new Resistor(name + " (open) pin " + k, p[k], p[0], OPEN_OHMS));
			}
			break;
		case COLLECTOR_EMITTER_SHORT:
		case DRAIN_SOURCE_SHORT:
			replacement = d;
			extra.add(new Resistor(name + " (" + fault.mode().words() + ")", p[0], p[2], SHORT_OHMS));
			break;
		case BASE_EMITTER_SHORT:
		case GATE_SOURCE_SHORT:
			replacement = d;
			extra.add(new Resistor(name + " (" + fault.mode().words() + ")", p[1], p[2], SHORT_OHMS));
			break;
		case OUTPUT_HIGH:
		case OUTPUT_LOW:
			// the output held at a rail through the short's 1 Ω, whatever the inputs say (pins: in+, in−, out, V+, V−)
			replacement = d;
			extra.add(new Resistor(name + " (" + fault.mode().words() + ")", p[2],
					fault.mode() == FailureMode.OUTPUT_HIGH ? p[3] : p[4], SHORT_OHMS));
			break;
		case WIPER_OPEN:
			// the track from a to b, the wiper left on a gigaohm
			replacement = new Resistor(name, p[0], p[1], ((bulwark.engine.circuit.Potentiometer) d).ohms());
			extra.add(new Resistor(name + " (wiper open)", p[2], p[0], OPEN_OHMS));
			break;
		default:
			throw new IllegalArgumentException("no way to apply " + fault.mode());
		}
		// a device's own internal nets (a diode's junction behind its series resistance) stay joined to its pins
		if (replacement != d) {
			for (int net : d.internalNets()) {
				extra.add(new Resistor(name + " (failed) inside", net, p[0], SHORT_OHMS));
			}
		}
		Circuit failed = circuit.withDevice(index, replacement).plus(extra);
		// the failed part is no longer the part its text describes: nothing judges its stresses
		Map<String, Part> parts = new LinkedHashMap<>(design.parts());
		parts.remove(name);
		return new CompiledDesign(design.design(), failed, parts, design.usedNets(), design.values());
	}
}

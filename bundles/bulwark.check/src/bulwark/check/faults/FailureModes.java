package bulwark.check.faults;

import static bulwark.check.faults.FailureMode.BASE_EMITTER_SHORT;
import static bulwark.check.faults.FailureMode.COLLECTOR_EMITTER_SHORT;
import static bulwark.check.faults.FailureMode.DRAIN_SOURCE_SHORT;
import static bulwark.check.faults.FailureMode.GATE_SOURCE_SHORT;
import static bulwark.check.faults.FailureMode.OPEN;
import static bulwark.check.faults.FailureMode.SHORT;
import static bulwark.check.faults.FailureMode.OUTPUT_HIGH;
import static bulwark.check.faults.FailureMode.OUTPUT_LOW;
import static bulwark.check.faults.FailureMode.WIPER_OPEN;

import java.util.List;

import bulwark.lang.design.PartKind;

/**
 * The ways each kind of part is failed, one at a time, in the spirit of IEC 61010-1's single fault condition
 * (clause 4.4: each component short-circuited or open-circuited, whichever is less favourable) [the clause's
 * wording from memory]. Not failed: sources and batteries (they are the supply and the abuse, not parts of
 * the protection), fuses (bypassing one is a choice a policy would make; not yet offered), comparators
 * (an output stuck at a rail; not yet modelled) and potentiometers (not yet modelled) — the analysis lists them.
 */
public final class FailureModes {
	private FailureModes() {
	}

	public static List<FailureMode> of(PartKind kind) {
		switch (kind) {
		case RESISTOR:
		case CAPACITOR:
		case DIODE:
		case ZENER:
		case LED:
		case PROTECTOR:
		case INDICATOR:
			return List.of(SHORT, OPEN);
		case INDUCTOR:
			return List.of(OPEN); // a winding shorted is what an inductor nearly is at DC and mains already
		case LINK:
			return List.of(OPEN); // a link is a short already: it can only crack open
		case NPN:
		case PNP:
			return List.of(COLLECTOR_EMITTER_SHORT, BASE_EMITTER_SHORT, OPEN);
		case NMOS:
		case PMOS:
			return List.of(DRAIN_SOURCE_SHORT, GATE_SOURCE_SHORT, OPEN);
		case COMPARATOR:
			return List.of(OUTPUT_HIGH, OUTPUT_LOW); // a failed output stage stuck at either rail
		case POTENTIOMETER:
			return List.of(WIPER_OPEN); // a worn track lifts the wiper; the track itself goes on conducting
		default:
			return List.of();
		}
	}
}

package bulwark.check.function;

import java.util.Optional;

import bulwark.check.compile.CompiledDesign;
import bulwark.check.parts.Settings;
import bulwark.engine.solve.DcSolution;
import bulwark.engine.solve.OperatingPoint;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;

/**
 * What shows the input's state to its user: the first indicator (on at its activation current), else the
 * first LED (on from {@link #LED_ON} of forward current), else the first comparator (on when its output is
 * nearer its positive supply).
 */
public final class IndicatorState {
	/** Forward current at which an LED is visibly lit: the same as an LED under test (FunctionAnalysis). */
	static final double LED_ON = FunctionAnalysis.LED_LIT;
	/** Activation current of an indicator when the design gives none; as DeviceModels [common practice]. */
	static final double INDICATOR_ON = 1e-3;

	private final Part part;

	private IndicatorState(Part part) {
		this.part = part;
	}

	public static Optional<IndicatorState> of(CompiledDesign design) {
		for (PartKind kind : new PartKind[] { PartKind.INDICATOR, PartKind.LED, PartKind.COMPARATOR }) {
			for (Part p : design.parts().values()) {
				if (p.getKind() == kind) {
					return Optional.of(new IndicatorState(p));
				}
			}
		}
		return Optional.empty();
	}

	public String part() {
		return part.getName();
	}

	public boolean on(DcSolution s) {
		OperatingPoint p = s.device(part.getName());
		switch (part.getKind()) {
		case INDICATOR:
			return Math.abs(p.current()) >= Settings.parameter(part, "activation").orElse(INDICATOR_ON);
		case LED:
			return p.current() >= LED_ON;
		default:
			return p.pinVoltage("out") > (p.pinVoltage("supply_plus") + p.pinVoltage("supply_minus")) / 2;
		}
	}
}

package bulwark.check;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import bulwark.check.compile.CompiledDesign;
import bulwark.check.compile.ResistorRatings;
import bulwark.check.compile.Settings;
import bulwark.engine.dc.DcSolution;
import bulwark.engine.dc.OperatingPoint;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;

/**
 * Every part's figures in one solved case. A resistor's utilisation is the larger of P / rated power and
 * |V| / limiting element voltage (rated, or by package; see ResistorRatings), over whichever the design gives.
 */
final class Stresses {
	private Stresses() {
	}

	static List<PartStress> of(CompiledDesign design, DcSolution solution) {
		List<PartStress> result = new ArrayList<>();
		for (Part part : design.parts().values()) {
			OperatingPoint p = solution.device(part.getName());
			Double utilisation = null;
			String limiting = null;
			if (part.getKind() == PartKind.RESISTOR) {
				Optional<Double> power = Settings.rating(part, "power");
				Optional<Double> voltage = ResistorRatings.limitingElementVoltage(part)
						.map(ResistorRatings.VoltageRating::volts);
				if (power.isPresent()) {
					utilisation = Math.abs(p.power()) / power.get();
					limiting = "power";
				}
				if (voltage.isPresent() && (utilisation == null || Math.abs(p.voltage()) / voltage.get() > utilisation)) {
					utilisation = Math.abs(p.voltage()) / voltage.get();
					limiting = "voltage";
				}
			}
			result.add(new PartStress(part.getName(), p.voltage(), p.current(), p.power(), utilisation, limiting));
		}
		return result;
	}
}

package bulwark.fix;

import java.util.List;
import java.util.Map;
import java.util.Optional;

import bulwark.check.rules.ReversePathRule;
import bulwark.check.finding.Finding;
import bulwark.check.fix.Fix;
import bulwark.check.fix.TextEdit;
import bulwark.check.figures.Figures;
import bulwark.lang.design.Member;
import bulwark.lang.design.Part;
import bulwark.lang.design.PinBinding;
import bulwark.lang.design.Terminal;

/**
 * Blocks a reverse path where it enters: a diode between the driving terminal's net and the first part on
 * the path, its cathode at the terminal, so that the polarity the finding names reverse-biases it. Its
 * reverse rating is the first step above the worst abuse voltage of the policy over its derating
 * [common practice: rectifier steps 400 … 1500 V].
 */
final class BlockReversePath implements FixProvider {
	private static final double[] REVERSE = { 400, 600, 1000, 1500 };

	@Override
	public List<Fix> propose(FixContext context, Finding finding) {
		if (!finding.rule().equals(ReversePathRule.ID)) {
			return List.of();
		}
		String message = finding.message();
		int start = message.indexOf("nothing blocking it: "), end = message.indexOf("; its ");
		if (start < 0 || end < start) {
			return List.of();
		}
		String[] path = message.substring(start + "nothing blocking it: ".length(), end).split(" → ");
		if (path.length < 2) {
			return List.of();
		}
		Terminal terminal = null;
		for (Member m : context.design().getMembers()) {
			if (m instanceof Terminal t && t.getName().equals(path[0])) {
				terminal = t;
			}
		}
		Optional<Part> first = PartText.part(context.design(), path[1]);
		if (terminal == null || first.isEmpty()) {
			return List.of();
		}
		String termNet = terminal.getNet().getName();
		String pin = null;
		for (PinBinding b : first.get().getPins()) {
			if (b.getNet() == terminal.getNet()) {
				pin = b.getPin();
			}
		}
		if (pin == null) {
			return List.of();
		}
		double worst = context.policy().mains().stream().mapToDouble(m -> m.peakVolts()).max().orElse(0);
		worst = Math.max(worst, context.policy().levels().stream().mapToDouble(Double::doubleValue).max().orElse(0));
		double factor = context.policy().derating(bulwark.lang.design.PartKind.DIODE, "reverse").factor();
		double rating = Double.NaN;
		for (double r : REVERSE) {
			if (r * factor >= worst) {
				rating = r;
				break;
			}
		}
		if (Double.isNaN(rating)) {
			return List.of();
		}
		String net = PartText.freeName(context.design(), first.get().getName() + "_IN");
		String name = PartText.freeName(context.design(), "D_BLOCK_" + terminal.getName());
		String written = Figures.engineering(rating, "V");
		TextEdit diode = PartText.insertAfter(context.text(), first.get(), "diode " + name + " (anode: " + net
				+ ", cathode: " + PartText.escapeName(termNet) + ") {\n" + PartText.INDENT + "rated reverse " + written + "\n"
				+ PartText.INDENT + "rated forward 1 A\n" + PartText.INDENT + "rated power 1 W\n}");
		TextEdit repoint = PartText.repoint(context.text(), first.get(), pin, net);
		TextEdit declare = PartText.addNet(context.text(), context.design(), net);
		return List.of(new Fix("block the path at " + terminal.getName() + ": " + name + " (" + written
				+ " reverse) between " + terminal.getName() + " and " + first.get().getName(),
				Map.of("blocking_elements", 0.0), Map.of("blocking_elements", 1.0, "rated_reverse", rating),
				Edits.backwards(diode, repoint, declare)));
	}
}

package bulwark.fix;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.eclipse.xtext.nodemodel.ICompositeNode;
import org.eclipse.xtext.nodemodel.util.NodeModelUtils;

import bulwark.check.finding.Finding;
import bulwark.check.parts.Settings;
import bulwark.check.fix.Fix;
import bulwark.check.fix.TextEdit;
import bulwark.check.figures.Figures;
import bulwark.lang.design.Parameter;
import bulwark.lang.design.Part;
import bulwark.lang.design.PinBinding;
import bulwark.lang.design.Setting;

/**
 * Splits a resistor over its limiting element voltage into N equal parts in series, N the fewest that
 * bring each part's share of the worst voltage within its derated limit; each part's value is the nearest
 * E24 value to R/N (IEC 60063), so the string's total stays close to the original, and each keeps the
 * original's package and ratings. The new parts and nets are laid out as the formatter lays them out.
 */
final class SplitResistor implements FixProvider {
	/** More parts than this is a design change, not a fix. */
	static final int MOST = 6;

	@Override
	public List<Fix> propose(FixContext context, Finding finding) {
		Optional<Part> found = PartText.overVoltageResistor(context.design(), finding);
		if (found.isEmpty()) {
			return List.of();
		}
		Part part = found.get();
		Optional<Double> ohms = Settings.parameter(part, "value");
		if (ohms.isEmpty()) {
			return List.of();
		}
		int n = (int) Math.ceil(finding.value() / finding.limit() * (1 + 1e-9));
		if (n < 2 || n > MOST) {
			return List.of();
		}
		double each = PreferredValues.nearest(ohms.get() / n, 24);
		String text = context.text();
		ICompositeNode node = NodeModelUtils.findActualNodeFor(part);
		String a = net(part, "a"), b = net(part, "b");
		StringBuilder replacement = new StringBuilder();
		List<String> nets = new ArrayList<>();
		for (int i = 1; i < n; i++) {
			nets.add(part.getName() + "_N" + i);
			replacement.append("net ").append(part.getName()).append("_N").append(i).append('\n');
		}
		replacement.append('\n');
		for (int i = 1; i <= n; i++) {
			String from = i == 1 ? a : nets.get(i - 2), to = i == n ? b : nets.get(i - 1);
			replacement.append("resistor ").append(part.getName()).append('_').append(i).append(" (a: ").append(from)
					.append(", b: ").append(to).append(")");
			if (part.getBase() != null && !part.getBase().eIsProxy()) {
				replacement.append(" is ").append(part.getBase().getName());
			}
			replacement.append(" {\n");
			for (Setting s : part.getSettings()) {
				String written = PartText.tokens(s);
				if (s instanceof Parameter p && p.getName().equals("value")) {
					written = "value " + Figures.engineering(each, "Ω")
							+ (p.getTolerance() == null ? "" : " ± " + p.getTolerance().getPercent() + " %");
				}
				replacement.append(PartText.INDENT).append(written).append('\n');
			}
			if (PartText.own(part, "value", false).isEmpty()) {
				replacement.append(PartText.INDENT).append("value ").append(Figures.engineering(each, "Ω")).append('\n');
			}
			replacement.append("}").append(i < n ? "\n\n" : "");
		}
		TextEdit edit = PartText.edit(text, node.getOffset(), node.getLength(), replacement.toString());
		double share = finding.value() / n;
		String label = String.format(Locale.ROOT,
				"split %s into %d × %s in series (%s each, %.0f %% of the limit, was %.0f %%; total %s for %s)",
				part.getName(), n, Figures.engineering(each, "Ω"), Figures.engineering(share, "V"),
				100 * share / finding.limit(), 100 * finding.value() / finding.limit(), Figures.engineering(n * each, "Ω"),
				Figures.engineering(ohms.get(), "Ω"));
		return List.of(new Fix(label, Map.of("parts", 1.0, "voltage", finding.value(), "ohms", ohms.get()),
				Map.of("parts", (double) n, "voltage", share, "ohms", n * each), List.of(edit)));
	}

	private static String net(Part part, String pin) {
		for (PinBinding b : part.getPins()) {
			if (b.getPin().equals(pin)) {
				return NodeModelUtils.getTokenText(NodeModelUtils.findNodesForFeature(b,
						bulwark.lang.design.DesignPackage.Literals.PIN_BINDING__NET).get(0));
			}
		}
		throw new IllegalArgumentException(part.getName() + " has no pin " + pin);
	}
}

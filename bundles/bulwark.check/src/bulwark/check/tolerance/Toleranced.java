package bulwark.check.tolerance;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

import bulwark.check.parts.Settings;
import bulwark.lang.design.Design;
import bulwark.lang.design.Member;
import bulwark.lang.design.Parameter;
import bulwark.lang.design.Part;
import bulwark.lang.design.Setting;

/** A parameter written with a tolerance ("value 10 kΩ ± 1 %"): the part, the parameter and ± as a fraction. */
public record Toleranced(String part, String parameter, double fraction) {

	/** Every toleranced parameter of the design's parts (their own or their definition's, the part's first). */
	public static List<Toleranced> of(Design design) {
		List<Toleranced> all = new ArrayList<>();
		for (Member m : design.getMembers()) {
			if (!(m instanceof Part part)) {
				continue;
			}
			Set<String> seen = new LinkedHashSet<>();
			for (Setting s : Settings.all(part)) {
				if (s instanceof Parameter p && p.getTolerance() != null && p.getValue() != null && seen.add(p.getName())) {
					all.add(new Toleranced(part.getName(), p.getName(),
							Double.parseDouble(p.getTolerance().getPercent()) / 100));
				} else if (s instanceof Parameter p) {
					seen.add(p.getName()); // the part's own value without tolerance hides the definition's
				}
			}
		}
		return all;
	}

	public String key() {
		return bulwark.check.compile.Variation.key(part, parameter);
	}
}

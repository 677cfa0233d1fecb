package bulwark.check.fix;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A change that removes a finding, already checked: its label says what changes, {@code before} and
 * {@code after} give the figures it moves (SI values, by name), and the edits make it, last one first in
 * the text so that offsets stay valid when applied in order.
 */
public record Fix(String label, Map<String, Double> before, Map<String, Double> after, List<TextEdit> edits) {
	public Fix {
		before = Collections.unmodifiableMap(new LinkedHashMap<>(before));
		after = Collections.unmodifiableMap(new LinkedHashMap<>(after));
		edits = List.copyOf(edits);
	}

	/** The text with every edit applied. */
	public String applyTo(String text) {
		String result = text;
		for (TextEdit e : edits) {
			result = e.applyTo(result);
		}
		return result;
	}
}

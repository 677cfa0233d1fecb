package bulwark.fix;

import java.util.Optional;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.xtext.nodemodel.ICompositeNode;
import org.eclipse.xtext.nodemodel.util.NodeModelUtils;

import bulwark.check.fix.TextEdit;
import bulwark.lang.design.Design;
import bulwark.lang.design.Member;
import bulwark.lang.design.Part;
import bulwark.lang.design.Rating;
import bulwark.lang.design.Setting;
import bulwark.check.finding.Finding;
import bulwark.check.rules.ResistorVoltageRule;
import bulwark.check.rules.SeriesStringRule;
import bulwark.lang.design.PartKind;

/**
 * Text edits on a part as the formatter lays it out (two-space indent, one setting per line): replacing a
 * setting's value, or adding a setting inside the part's braces (making the braces when there are none).
 */
final class PartText {
	static final String INDENT = "  ";

	private PartText() {
	}

	/**
	 * The resistor a resistor-voltage or series-string finding is about, when the finding carries its
	 * figures: what both the package and the split fix start from.
	 */
	static Optional<Part> overVoltageResistor(Design design, Finding finding) {
		boolean voltage = finding.rule().equals(ResistorVoltageRule.ID) || finding.rule().equals(SeriesStringRule.ID);
		if (!voltage || finding.part() == null || finding.value() == null || finding.limit() == null) {
			return Optional.empty();
		}
		return part(design, finding.part()).filter(p -> p.getKind() == PartKind.RESISTOR);
	}

	static Optional<Part> part(Design design, String name) {
		for (Member m : design.getMembers()) {
			if (m instanceof Part p && p.getName().equals(name)) {
				return Optional.of(p);
			}
		}
		return Optional.empty();
	}

	/** The part's own setting of that name, rating or parameter. */
	static Optional<Setting> own(Part part, String name, boolean rating) {
		return part.getSettings().stream().filter(s -> s.getName().equals(name) && (s instanceof Rating) == rating)
				.findFirst();
	}

	/** Replaces a setting's quantity (or word) with new text. */
	static TextEdit replaceValue(String text, Setting setting, String value) {
		ICompositeNode node = NodeModelUtils.findActualNodeFor(setting.getValue() != null ? setting.getValue() : setting);
		if (setting.getValue() == null) {
			// a word parameter (package 0805): replace the word after the name
			node = NodeModelUtils.findActualNodeFor(setting);
			return edit(text, node.getOffset(), node.getLength(), setting.getName() + " " + value);
		}
		return edit(text, node.getOffset(), node.getLength(), value);
	}

	/** Adds a setting line at the end of the part's braces, or braces with it after the pins. */
	static TextEdit addSetting(String text, Part part, String setting) {
		ICompositeNode node = NodeModelUtils.findActualNodeFor(part);
		int end = node.getEndOffset();
		String own = text.substring(node.getOffset(), end);
		if (own.endsWith("}")) {
			int close = end - 1;
			int lineStart = text.lastIndexOf('\n', close - 1) + 1;
			boolean onOwnLine = text.substring(lineStart, close).isBlank();
			if (onOwnLine) {
				return edit(text, lineStart, 0, INDENT + setting + "\n");
			}
			// a one-line block: lay it out, one setting per line
			int open = own.lastIndexOf('{') + node.getOffset();
			String inner = text.substring(open + 1, close).strip();
			StringBuilder block = new StringBuilder("{\n");
			for (Setting s : part.getSettings()) {
				block.append(INDENT).append(NodeModelUtils.getTokenText(NodeModelUtils.findActualNodeFor(s))).append('\n');
			}
			if (part.getSettings().isEmpty() && !inner.isEmpty()) {
				block.append(INDENT).append(inner).append('\n');
			}
			block.append(INDENT).append(setting).append("\n}");
			return edit(text, open, close + 1 - open, block.toString());
		}
		return edit(text, end, 0, " {\n" + INDENT + setting + "\n}");
	}

	static TextEdit edit(String text, int offset, int length, String replacement) {
		int line = 1, lineStart = 0;
		for (int i = 0; i < offset; i++) {
			if (text.charAt(i) == '\n') {
				line++;
				lineStart = i + 1;
			}
		}
		return new TextEdit(offset, length, replacement, line, offset - lineStart + 1);
	}

	/** A new member written after an existing one, a blank line between, as the formatter lays parts out. */
	static TextEdit insertAfter(String text, EObject member, String block) {
		ICompositeNode node = NodeModelUtils.findActualNodeFor(member);
		return edit(text, node.getEndOffset(), 0, "\n\n" + block);
	}

	/** Points one pin of a part at another net. */
	static TextEdit repoint(String text, Part part, String pin, String net) {
		for (bulwark.lang.design.PinBinding b : part.getPins()) {
			if (b.getPin().equals(pin)) {
				var node = NodeModelUtils.findNodesForFeature(b, bulwark.lang.design.DesignPackage.Literals.PIN_BINDING__NET)
						.get(0);
				return edit(text, node.getOffset(), node.getLength(), net);
			}
		}
		throw new IllegalArgumentException(part.getName() + " has no pin " + pin);
	}

	/** A net declared after the design's last net declaration. */
	static TextEdit addNet(String text, Design design, String name) {
		EObject last = null;
		for (Member m : design.getMembers()) {
			if (m instanceof bulwark.lang.design.Net) {
				last = m;
			}
		}
		ICompositeNode node = NodeModelUtils.findActualNodeFor(last);
		return edit(text, node.getEndOffset(), 0, "\nnet " + name);
	}

	/** The name of the net a pin is on, as written. */
	static String netOf(Part part, String pin) {
		for (bulwark.lang.design.PinBinding b : part.getPins()) {
			if (b.getPin().equals(pin)) {
				return NodeModelUtils.getTokenText(NodeModelUtils
						.findNodesForFeature(b, bulwark.lang.design.DesignPackage.Literals.PIN_BINDING__NET).get(0));
			}
		}
		throw new IllegalArgumentException(part.getName() + " has no pin " + pin);
	}

	/** A net name as it must be written (a keyword gets its ^). */
	static String escapeName(String name) {
		return name;
	}

	/** A name not yet used in the design, from a stem. */
	static String freeName(Design design, String stem) {
		java.util.Set<String> used = new java.util.HashSet<>();
		for (Member m : design.getMembers()) {
			used.add(m.getName());
		}
		String name = stem;
		for (int i = 2; used.contains(name); i++) {
			name = stem + "_" + i;
		}
		return name;
	}

	/** The text of an element as written, tokens separated by single spaces. */
	static String tokens(EObject element) {
		return NodeModelUtils.getTokenText(NodeModelUtils.findActualNodeFor(element));
	}
}

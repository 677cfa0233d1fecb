package bulwark.lang.formatting2;

import java.util.HashMap;
import java.util.List;

import org.eclipse.xtext.formatting2.AbstractJavaFormatter;
import org.eclipse.xtext.formatting2.FormatterPreferenceKeys;
import org.eclipse.xtext.formatting2.FormatterRequest;
import org.eclipse.xtext.formatting2.IFormattableDocument;
import org.eclipse.xtext.formatting2.regionaccess.ISemanticRegion;
import org.eclipse.xtext.preferences.ITypedPreferenceValues;
import org.eclipse.xtext.preferences.MapBasedPreferenceValues;

import bulwark.lang.design.Action;
import bulwark.lang.design.Apply;
import bulwark.lang.design.Case;
import bulwark.lang.design.Connect;
import bulwark.lang.design.Definition;
import bulwark.lang.design.Design;
import bulwark.lang.design.DesignPackage;
import bulwark.lang.design.Library;
import bulwark.lang.design.Member;
import bulwark.lang.design.Net;
import bulwark.lang.design.Parameter;
import bulwark.lang.design.Part;
import bulwark.lang.design.PinBinding;
import bulwark.lang.design.Quantity;
import bulwark.lang.design.Rating;
import bulwark.lang.design.Setting;
import bulwark.lang.design.Terminal;
import bulwark.lang.design.Tolerance;
import bulwark.lang.design.Use;
import bulwark.lang.design.Waiver;

/**
 * The house layout of a design: the header lines, then nets and terminals one per line, each part after a
 * blank line with its pins as "(a: x, b: y)" and its settings one per line, indented, between braces.
 * Comments stay where they are. Quick fixes edit the model and let this lay the text out.
 */
public class BulwarkFormatter extends AbstractJavaFormatter {
	/** Indentation when the caller sets none: two spaces, as the demo designs and the documentation write. */
	static final String INDENTATION = "  ";

	@Override
	protected void initialize(FormatterRequest request) {
		ITypedPreferenceValues given = request.getPreferences();
		boolean explicit = given instanceof MapBasedPreferenceValues m
				&& m.getValues().containsKey(FormatterPreferenceKeys.indentation.getId());
		if (!explicit) {
			MapBasedPreferenceValues values = new MapBasedPreferenceValues(given, new HashMap<>());
			values.put(FormatterPreferenceKeys.indentation, INDENTATION);
			putIndentationLength(values);
			request.setPreferences(values);
		}
		super.initialize(request);
	}

	protected void format(Design design, IFormattableDocument doc) {
		var regions = regionFor(design);
		doc.append(regions.keyword("design"), f -> f.oneSpace());
		doc.prepend(regions.keyword("purpose"), f -> f.newLine());
		doc.append(regions.keyword("purpose"), f -> f.oneSpace());
		doc.prepend(regions.keyword("revision"), f -> f.newLine());
		doc.append(regions.keyword("revision"), f -> f.oneSpace());
		for (Use use : design.getUses()) {
			doc.prepend(use, f -> f.setNewLines(1, 2, 2));
			doc.append(regionFor(use).keyword("use"), f -> f.oneSpace());
		}
		Member previous = null;
		for (Member member : design.getMembers()) {
			boolean loose = previous == null || member instanceof Part || previous instanceof Part
					|| member instanceof Definition || previous instanceof Definition
					|| member.getClass() != previous.getClass();
			doc.prepend(member, f -> f.setNewLines(loose ? 2 : 1, loose ? 2 : 1, 2));
			doc.format(member);
			previous = member;
		}
		for (Waiver waiver : design.getWaivers()) {
			doc.prepend(waiver, f -> f.setNewLines(2, 2, 2));
			var w = regionFor(waiver);
			for (String word : new String[] { "waive", "because", "by" }) {
				doc.append(w.keyword(word), f -> f.oneSpace());
			}
			for (ISemanticRegion on : w.keywords("on")) {
				doc.surround(on, f -> f.oneSpace());
			}
			doc.prepend(w.keyword("because"), f -> f.newLine());
			doc.prepend(w.keyword("by"), f -> f.oneSpace());
			doc.interior(w.keyword("waive"), w.feature(DesignPackage.Literals.WAIVER__DATE), f -> f.indent());
		}
		doc.append(design, f -> f.setNewLines(1, 1, 1));
	}

	protected void format(Net net, IFormattableDocument doc) {
		var regions = regionFor(net);
		doc.append(regions.keyword("reference"), f -> f.oneSpace());
		doc.append(regions.keyword("net"), f -> f.oneSpace());
	}

	protected void format(Terminal terminal, IFormattableDocument doc) {
		var regions = regionFor(terminal);
		doc.append(regions.keyword("terminal"), f -> f.oneSpace());
		doc.prepend(regions.feature(DesignPackage.Literals.TERMINAL__LABEL), f -> f.oneSpace());
		doc.surround(regions.keyword("at"), f -> f.oneSpace());
		doc.prepend(regions.keyword("common"), f -> f.oneSpace());
	}

	protected void format(Part part, IFormattableDocument doc) {
		var regions = regionFor(part);
		doc.prepend(regions.feature(DesignPackage.Literals.MEMBER__NAME), f -> f.oneSpace());
		ISemanticRegion open = regions.keyword("(");
		doc.prepend(open, f -> f.oneSpace());
		doc.append(open, f -> f.noSpace());
		doc.prepend(regions.keyword(")"), f -> f.noSpace());
		for (ISemanticRegion comma : regions.keywords(",")) {
			doc.prepend(comma, f -> f.noSpace());
			doc.append(comma, f -> f.oneSpace());
		}
		for (PinBinding pin : part.getPins()) {
			var p = regionFor(pin);
			doc.prepend(p.keyword(":"), f -> f.noSpace());
			doc.append(p.keyword(":"), f -> f.oneSpace());
		}
		doc.surround(regions.keyword("is"), f -> f.oneSpace());
		block(regions.keyword("{"), regions.keyword("}"), part.getSettings(), doc);
	}

	protected void format(Definition definition, IFormattableDocument doc) {
		var regions = regionFor(definition);
		doc.append(regions.keyword("define"), f -> f.oneSpace());
		doc.prepend(regions.feature(DesignPackage.Literals.MEMBER__NAME), f -> f.oneSpace());
		block(regions.keyword("{"), regions.keyword("}"), definition.getSettings(), doc);
	}

	protected void format(Library library, IFormattableDocument doc) {
		doc.append(regionFor(library).keyword("library"), f -> f.oneSpace());
		for (Use use : library.getUses()) {
			doc.prepend(use, f -> f.setNewLines(1, 1, 2));
			doc.append(regionFor(use).keyword("use"), f -> f.oneSpace());
		}
		for (Definition definition : library.getDefinitions()) {
			doc.prepend(definition, f -> f.setNewLines(2, 2, 2));
			doc.format(definition);
		}
		doc.append(library, f -> f.setNewLines(1, 1, 1));
	}

	/** Settings in braces: one per line, indented; empty braces on one line. */
	private void block(ISemanticRegion braceOpen, ISemanticRegion braceClose, List<Setting> settings,
			IFormattableDocument doc) {
		if (braceOpen == null) {
			return;
		}
		doc.prepend(braceOpen, f -> f.oneSpace());
		if (settings.isEmpty()) {
			doc.append(braceOpen, f -> f.oneSpace());
		} else {
			doc.interior(braceOpen, braceClose, f -> f.indent());
			for (Setting setting : settings) {
				doc.prepend(setting, f -> f.newLine());
				doc.format(setting);
			}
			doc.prepend(braceClose, f -> f.newLine());
		}
	}

	protected void format(Case c, IFormattableDocument doc) {
		var regions = regionFor(c);
		doc.append(regions.keyword("case"), f -> f.oneSpace());
		ISemanticRegion open = regions.keyword("{");
		ISemanticRegion close = regions.keyword("}");
		doc.prepend(open, f -> f.oneSpace());
		if (c.getActions().isEmpty()) {
			doc.append(open, f -> f.oneSpace());
			return;
		}
		doc.interior(open, close, f -> f.indent());
		for (Action action : c.getActions()) {
			doc.prepend(action, f -> f.newLine());
			var a = regionFor(action);
			for (String word : new String[] { "apply", "connect", "short" }) {
				doc.append(a.keyword(word), f -> f.oneSpace());
			}
			for (String word : new String[] { "behind", "from", "to" }) {
				doc.surround(a.keyword(word), f -> f.oneSpace());
			}
			for (Quantity q : quantities(action)) {
				doc.prepend(regionFor(q).feature(DesignPackage.Literals.QUANTITY__UNIT), f -> f.oneSpace());
			}
		}
		doc.prepend(close, f -> f.newLine());
	}

	private static java.util.List<Quantity> quantities(Action action) {
		java.util.List<Quantity> list = new java.util.ArrayList<>();
		if (action instanceof Apply a) {
			list.add(a.getValue());
			if (a.getResistance() != null) {
				list.add(a.getResistance());
			}
		} else if (action instanceof Connect c) {
			list.add(c.getValue());
		}
		return list;
	}

	protected void format(Parameter parameter, IFormattableDocument doc) {
		doc.prepend(regionFor(parameter).feature(DesignPackage.Literals.PARAMETER__WORD), f -> f.oneSpace());
		doc.format(parameter.getValue());
		doc.format(parameter.getTolerance());
	}

	protected void format(Rating rating, IFormattableDocument doc) {
		var regions = regionFor(rating);
		doc.append(regions.keyword("rated"), f -> f.oneSpace());
		doc.format(rating.getValue());
	}

	protected void format(Quantity quantity, IFormattableDocument doc) {
		doc.prepend(quantity, f -> f.oneSpace());
		doc.prepend(regionFor(quantity).feature(DesignPackage.Literals.QUANTITY__UNIT), f -> f.oneSpace());
	}

	protected void format(Tolerance tolerance, IFormattableDocument doc) {
		var regions = regionFor(tolerance);
		doc.prepend(tolerance, f -> f.oneSpace());
		doc.prepend(regions.feature(DesignPackage.Literals.TOLERANCE__PERCENT), f -> f.oneSpace());
		doc.prepend(regions.keyword("%"), f -> f.oneSpace());
	}

	/** The framework still reads the deprecated length key beside the indentation string: both are given. */
	@SuppressWarnings("deprecation")
	private static void putIndentationLength(MapBasedPreferenceValues values) {
		values.put(FormatterPreferenceKeys.indentationLength, INDENTATION.length());
	}
}

package bulwark.check.report;

import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

import javax.xml.stream.XMLOutputFactory;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamWriter;

import bulwark.check.DesignResult;
import bulwark.check.finding.Finding;
import bulwark.check.finding.Severity;
import bulwark.check.rules.Rule;
import bulwark.check.rules.RuleRegistry;

/**
 * JUnit XML, which every CI server shows (well-formed whatever a name holds: see Printable): one test suite per design, one test case per rule (a failure
 * for each unwaived error finding of it), plus the cases "language" and "solver", which end in an error
 * when the design could not be read or solved.
 */
public final class JUnitReport {
	private JUnitReport() {
	}

	/** One test case as it will be written: passed (kind null), or a failure, an error, skipped. */
	private record Case(String name, String kind, String message, String body) {
	}

	public static void write(List<DesignResult> results, Writer out) throws XMLStreamException {
		// the counts stand on the elements that hold the cases, so each design's cases are worked out first
		List<List<Case>> suites = new ArrayList<>();
		for (DesignResult r : results) {
			suites.add(cases(r));
		}
		XMLStreamWriter xml = XMLOutputFactory.newFactory().createXMLStreamWriter(out);
		xml.writeStartDocument("UTF-8", "1.0");
		xml.writeCharacters("\n");
		xml.writeStartElement("testsuites");
		xml.writeAttribute("name", "bulwark");
		counts(xml, suites.stream().flatMap(List::stream).toList());
		for (int i = 0; i < results.size(); i++) {
			DesignResult r = results.get(i);
			String file = Printable.of(shown(r.file()));
			xml.writeCharacters("\n  ");
			xml.writeStartElement("testsuite");
			xml.writeAttribute("name", file);
			counts(xml, suites.get(i));
			// the caution, as a property of each suite: CI pages show properties beside the cases
			xml.writeCharacters("\n    ");
			xml.writeStartElement("properties");
			xml.writeCharacters("\n      ");
			xml.writeEmptyElement("property");
			xml.writeAttribute("name", "caution");
			xml.writeAttribute("value", Caution.TEXT);
			xml.writeCharacters("\n    ");
			xml.writeEndElement();
			for (Case c : suites.get(i)) {
				xml.writeCharacters("\n    ");
				xml.writeStartElement("testcase");
				xml.writeAttribute("classname", file);
				xml.writeAttribute("name", c.name());
				if (c.kind() != null) {
					xml.writeStartElement(c.kind());
					xml.writeAttribute("message", Printable.of(c.message()));
					xml.writeCharacters(c.body());
					xml.writeEndElement();
				}
				xml.writeEndElement();
			}
			xml.writeCharacters("\n  ");
			xml.writeEndElement();
		}
		xml.writeCharacters("\n");
		xml.writeEndElement();
		xml.writeCharacters("\n");
		xml.writeEndDocument();
		xml.flush();
	}

	/** tests, failures, errors and skipped, as CI pages read them off the element. */
	private static void counts(XMLStreamWriter xml, List<Case> cases) throws XMLStreamException {
		xml.writeAttribute("tests", Integer.toString(cases.size()));
		for (String kind : new String[] { "failure", "error", "skipped" }) {
			long n = cases.stream().filter(c -> kind.equals(c.kind())).count();
			xml.writeAttribute(kind.equals("skipped") ? "skipped" : kind + "s", Long.toString(n));
		}
	}

	/** A design file as the suite names it: relative to the folder Bulwark runs in, when it lies below it. */
	public static String shown(String file) {
		return WorkingFolder.below(file).orElse(file);
	}

	/** The cases of one design: "language", "solver", then one per rule. */
	private static List<Case> cases(DesignResult r) {
		List<String> names = new ArrayList<>(List.of("language", "solver"));
		for (Rule rule : RuleRegistry.all()) {
			names.add(rule.info().id().text());
		}
		List<Case> cases = new ArrayList<>();
		for (String name : names) {
			List<Finding> errors = r.findings().stream()
					.filter(f -> f.severity() == Severity.ERROR && !f.waived() && group(f).equals(name))
					.collect(Collectors.toList());
			if (!errors.isEmpty()) {
				boolean notChecked = name.equals("language") || name.equals("solver");
				cases.add(new Case(name, notChecked ? "error" : "failure", errors.get(0).message(),
						errors.stream().map(f -> TextReport.line(r.file(), f)).collect(Collectors.joining("\n"))));
				continue;
			}
			if (name.equals(bulwark.check.rules.RatingMissingRule.ID.text())) {
				// parts without a rating were not judged: a skipped case, so that CI never shows them green
				List<Finding> unchecked = r.findings().stream().filter(f -> !f.waived() && group(f).equals(name))
						.collect(Collectors.toList());
				if (!unchecked.isEmpty()) {
					cases.add(new Case(name, "skipped", unchecked.size() + " part(s) not checked: " + unchecked.get(0).message(),
							unchecked.stream().map(f -> TextReport.line(r.file(), f)).collect(Collectors.joining("\n"))));
					continue;
				}
			}
			cases.add(new Case(name, null, null, null));
		}
		return cases;
	}

	/** Which test case a finding belongs to. */
	private static String group(Finding f) {
		switch (f.rule().text()) {
		case "syntax":
		case "structure":
		case "file":
		case "waiver":
			return "language";
		default:
			return f.rule().text();
		}
	}
}

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

	public static void write(List<DesignResult> results, Writer out) throws XMLStreamException {
		XMLStreamWriter xml = XMLOutputFactory.newFactory().createXMLStreamWriter(out);
		xml.writeStartDocument("UTF-8", "1.0");
		xml.writeCharacters("\n");
		xml.writeStartElement("testsuites");
		xml.writeAttribute("name", "bulwark");
		for (DesignResult r : results) {
			List<String> names = new ArrayList<>(List.of("language", "solver"));
			for (Rule rule : RuleRegistry.all()) {
				names.add(rule.info().id().text());
			}
			xml.writeCharacters("\n  ");
			xml.writeStartElement("testsuite");
			xml.writeAttribute("name", Printable.of(r.file()));
			xml.writeAttribute("tests", Integer.toString(names.size()));
			// the caution, as a property of each suite: CI pages show properties beside the cases
			xml.writeCharacters("\n    ");
			xml.writeStartElement("properties");
			xml.writeCharacters("\n      ");
			xml.writeEmptyElement("property");
			xml.writeAttribute("name", "caution");
			xml.writeAttribute("value", Caution.TEXT);
			xml.writeCharacters("\n    ");
			xml.writeEndElement();
			for (String name : names) {
				List<Finding> errors = r.findings().stream()
						.filter(f -> f.severity() == Severity.ERROR && !f.waived() && group(f).equals(name))
						.collect(Collectors.toList());
				xml.writeCharacters("\n    ");
				xml.writeStartElement("testcase");
				xml.writeAttribute("classname", Printable.of(r.file()));
				xml.writeAttribute("name", name);
				if (!errors.isEmpty()) {
					boolean notChecked = name.equals("language") || name.equals("solver");
					xml.writeStartElement(notChecked ? "error" : "failure");
					xml.writeAttribute("message", Printable.of(errors.get(0).message()));
					xml.writeCharacters(errors.stream().map(f -> TextReport.line(r.file(), f))
							.collect(Collectors.joining("\n")));
					xml.writeEndElement();
				} else if (name.equals(bulwark.check.rules.RatingMissingRule.ID.text())) {
					// parts without a rating were not judged: a skipped case, so that CI never shows them green
					List<Finding> unchecked = r.findings().stream()
							.filter(f -> !f.waived() && group(f).equals(name)).collect(Collectors.toList());
					if (!unchecked.isEmpty()) {
						xml.writeStartElement("skipped");
						xml.writeAttribute("message", Printable.of(unchecked.size() + " part(s) not checked: " + unchecked.get(0).message()));
						xml.writeCharacters(unchecked.stream().map(f -> TextReport.line(r.file(), f))
								.collect(Collectors.joining("\n")));
						xml.writeEndElement();
					}
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

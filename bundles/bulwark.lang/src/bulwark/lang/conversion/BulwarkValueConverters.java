package bulwark.lang.conversion;

import org.eclipse.xtext.common.services.DefaultTerminalConverters;
import org.eclipse.xtext.conversion.IValueConverter;
import org.eclipse.xtext.conversion.ValueConverter;
import org.eclipse.xtext.conversion.ValueConverterException;
import org.eclipse.xtext.nodemodel.INode;

import com.google.inject.Inject;

/**
 * Converts the language's values. A {@code Name} is a word or a unit symbol written as a name (a terminal
 * {@code TA}, a net {@code s}); its value is the text without the '^' that may escape a word that is a
 * keyword, and it is written back with one only where the word would otherwise read as a keyword.
 */
public class BulwarkValueConverters extends DefaultTerminalConverters {
	@Inject
	private NameConverter name;

	@ValueConverter(rule = "Name")
	public IValueConverter<String> Name() {
		return name;
	}

	/** The name as the designer means it; written back as an ID would be, or as it stands when it is a unit. */
	public static class NameConverter implements IValueConverter<String> {
		@Inject
		private DefaultTerminalConverters terminals;

		@Override
		public String toValue(String string, INode node) throws ValueConverterException {
			return string == null ? null : string.startsWith("^") ? string.substring(1) : string;
		}

		@Override
		public String toString(String value) throws ValueConverterException {
			return value.matches("(a|f|p|n|u|µ|μ|m|k|M|G|T)?(Ω|ohm|Ohm|V|A|W|Ah|A²s|A2s|F|H|s|h|Hz|J)") ? value
					: terminals.ID().toString(value);
		}
	}
}

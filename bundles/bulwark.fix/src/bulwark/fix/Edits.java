package bulwark.fix;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import bulwark.check.fix.TextEdit;

/** Orders a fix's edits from the end of the text backwards, so that applying them in turn keeps offsets valid. */
final class Edits {
	private Edits() {
	}

	static List<TextEdit> backwards(TextEdit... edits) {
		List<TextEdit> list = new ArrayList<>(List.of(edits));
		list.sort(Comparator.comparingInt(TextEdit::offset).reversed());
		return list;
	}
}

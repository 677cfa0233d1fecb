package bulwark.ui.editor;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.jface.text.Position;

/**
 * Where the editor can fold: every brace block over more than one line (a part's settings, a definition, a
 * case) and every run of three or more comment lines. A lexical scan, so it works on text that does not parse;
 * braces inside strings and comments do not count. Each region runs from the start of its first line to the
 * end of its last, line break included.
 */
public final class FoldRegions {
	/** Comment runs shorter than this stay open: one or two lines read as well as their fold. */
	static final int COMMENT_RUN = 3;

	private FoldRegions() {
	}

	public static List<Position> of(String text) {
		int[] lineStarts = lineStarts(text);
		List<Position> regions = new ArrayList<>();
		List<Integer> open = new ArrayList<>();
		boolean inString = false, inComment = false;
		int line = 0, runStart = -1, runLength = 0;
		boolean lineHasCode = false, lineHasComment = false;
		for (int i = 0; i <= text.length(); i++) {
			char c = i < text.length() ? text.charAt(i) : '\n';
			if (c == '\n') {
				// comment runs: lines holding nothing but a comment
				if (lineHasComment && !lineHasCode) {
					if (runStart < 0) {
						runStart = line;
					}
					runLength++;
				} else {
					addRun(regions, lineStarts, text, runStart, runLength);
					runStart = -1;
					runLength = 0;
				}
				inString = false;
				inComment = false;
				lineHasCode = false;
				lineHasComment = false;
				line++;
				continue;
			}
			if (inComment) {
				continue;
			}
			if (inString && c == '\\') {
				i++; // an escaped character, perhaps a quote
				continue;
			}
			if (c == '"') {
				inString = !inString;
				lineHasCode = true;
			} else if (!inString && c == '#') {
				inComment = true;
				lineHasComment = true;
			} else if (!inString && c == '{') {
				open.add(line);
				lineHasCode = true;
			} else if (!inString && c == '}') {
				if (!open.isEmpty()) {
					int from = open.remove(open.size() - 1);
					if (line > from) {
						regions.add(span(lineStarts, text, from, line));
					}
				}
				lineHasCode = true;
			} else if (!Character.isWhitespace(c)) {
				lineHasCode = true;
			}
		}
		addRun(regions, lineStarts, text, runStart, runLength);
		regions.sort((a, b) -> Integer.compare(a.getOffset(), b.getOffset()));
		return regions;
	}

	private static void addRun(List<Position> regions, int[] lineStarts, String text, int runStart, int runLength) {
		if (runStart >= 0 && runLength >= COMMENT_RUN) {
			regions.add(span(lineStarts, text, runStart, runStart + runLength - 1));
		}
	}

	private static Position span(int[] lineStarts, String text, int firstLine, int lastLine) {
		int start = lineStarts[firstLine];
		int end = lastLine + 1 < lineStarts.length ? lineStarts[lastLine + 1] : text.length();
		return new Position(start, end - start);
	}

	private static int[] lineStarts(String text) {
		List<Integer> starts = new ArrayList<>();
		starts.add(0);
		for (int i = 0; i < text.length(); i++) {
			if (text.charAt(i) == '\n') {
				starts.add(i + 1);
			}
		}
		return starts.stream().mapToInt(Integer::intValue).toArray();
	}
}

package org.shutline.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.shutline.io.AtomicFiles;

/**
 * CSV tables (RFC 4180): comma separated, CRLF line ends, fields quoted when they
 * hold a comma, quote or line break, quotes doubled. UTF-8 without byte-order mark.
 */
public final class Csv {
    private Csv() {}

    public static String format(List<String> header, List<List<String>> rows) {
        StringBuilder sb = new StringBuilder();
        line(sb, header);
        for (List<String> r : rows) line(sb, r);
        return sb.toString();
    }

    public static void write(Path out, List<String> header, List<List<String>> rows) throws IOException {
        AtomicFiles.writeString(out, format(header, rows));
    }

    private static void line(StringBuilder sb, List<String> fields) {
        for (int i = 0; i < fields.size(); i++) {
            if (i > 0) sb.append(',');
            sb.append(quote(fields.get(i)));
        }
        sb.append("\r\n");
    }

    static String quote(String s) {
        if (s == null) return "";
        if (s.indexOf(',') < 0 && s.indexOf('"') < 0 && s.indexOf('\n') < 0 && s.indexOf('\r') < 0) return s;
        return '"' + s.replace("\"", "\"\"") + '"';
    }
}

package limen.session.journal;

import java.util.ArrayList;
import java.util.List;

/** The small part of RFC 4180 the journal needs: quoting on write, and a strict parser for one record. */
final class Csv {

    private Csv() {
    }

    static String line(List<String> fields) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < fields.size(); i++) {
            if (i > 0) {
                sb.append(',');
            }
            sb.append(quote(fields.get(i)));
        }
        return sb.toString();
    }

    static String quote(String field) {
        boolean needs = field.indexOf(',') >= 0 || field.indexOf('"') >= 0 || field.indexOf('\n') >= 0
                || field.indexOf('\r') >= 0;
        return needs ? '"' + field.replace("\"", "\"\"") + '"' : field;
    }

    /**
     * Parses one record (without its line break). Returns null if the text is not a well-formed record
     * (an unterminated quote, or text after a closing quote).
     */
    static List<String> parse(String record) {
        List<String> out = new ArrayList<>();
        StringBuilder field = new StringBuilder();
        int i = 0;
        int n = record.length();
        while (true) {
            if (i < n && record.charAt(i) == '"') {
                i++;
                while (true) {
                    if (i >= n) {
                        return null;
                    }
                    char c = record.charAt(i++);
                    if (c == '"') {
                        if (i < n && record.charAt(i) == '"') {
                            field.append('"');
                            i++;
                        } else {
                            break;
                        }
                    } else {
                        field.append(c);
                    }
                }
                if (i < n && record.charAt(i) != ',') {
                    return null;
                }
            } else {
                while (i < n && record.charAt(i) != ',') {
                    char c = record.charAt(i++);
                    if (c == '"') {
                        return null;
                    }
                    field.append(c);
                }
            }
            out.add(field.toString());
            field.setLength(0);
            if (i >= n) {
                return out;
            }
            i++; // the comma
        }
    }
}

package limen.session.refit;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads text written by {@link RefitTable#writeRecord}: RFC 4180 (Shafranovich 2005) records, fields
 * separated by commas, a field quoted with {@code "} when it holds a comma, quote or line break, a quote
 * inside a quoted field doubled; records end with LF or CRLF.
 */
final class Rfc4180 {

    private Rfc4180() {
    }

    /** @return the records of the text, in order; a final line end does not start another record */
    static List<List<String>> parse(String text) throws IOException {
        List<List<String>> records = new ArrayList<>();
        List<String> record = new ArrayList<>();
        StringBuilder field = new StringBuilder();
        int i = 0;
        int n = text.length();
        boolean any = false;
        while (i < n) {
            char c = text.charAt(i);
            if (c == '"' && field.length() == 0) {
                int close = i + 1;
                while (true) {
                    if (close >= n) {
                        throw new IOException("unclosed quote starting at character " + i);
                    }
                    if (text.charAt(close) == '"') {
                        if (close + 1 < n && text.charAt(close + 1) == '"') {
                            field.append('"');
                            close += 2;
                            continue;
                        }
                        break;
                    }
                    field.append(text.charAt(close++));
                }
                i = close + 1;
                if (i < n && text.charAt(i) != ',' && text.charAt(i) != '\n' && text.charAt(i) != '\r') {
                    throw new IOException("text after a closing quote at character " + i);
                }
                any = true;
                continue;
            }
            if (c == ',') {
                record.add(field.toString());
                field.setLength(0);
                any = true;
                i++;
            } else if (c == '\r' || c == '\n') {
                record.add(field.toString());
                field.setLength(0);
                records.add(record);
                record = new ArrayList<>();
                any = false;
                i += c == '\r' && i + 1 < n && text.charAt(i + 1) == '\n' ? 2 : 1;
            } else {
                field.append(c);
                any = true;
                i++;
            }
        }
        if (any || field.length() > 0) {
            record.add(field.toString());
            records.add(record);
        }
        return records;
    }
}

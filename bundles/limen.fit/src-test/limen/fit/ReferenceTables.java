package limen.fit;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Reads the small comma-separated reference tables in {@code reference/} (lines starting with '#' are comments). */
final class ReferenceTables {

    private ReferenceTables() {
    }

    static List<Map<String, String>> read(String resource) {
        try (InputStream in = ReferenceTables.class.getResourceAsStream("reference/" + resource)) {
            if (in == null) {
                throw new IllegalStateException("missing test resource reference/" + resource);
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            List<Map<String, String>> rows = new ArrayList<>();
            String[] header = null;
            for (String line; (line = r.readLine()) != null;) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String[] cells = line.split(",", -1);
                if (header == null) {
                    header = cells;
                    continue;
                }
                Map<String, String> row = new HashMap<>();
                for (int i = 0; i < header.length; i++) {
                    row.put(header[i].trim(), cells[i].trim());
                }
                rows.add(row);
            }
            return rows;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** @return the cells of one data set of reference_data.csv */
    static BinomialData dataset(String name) {
        List<Double> v = new ArrayList<>();
        List<Integer> n = new ArrayList<>();
        List<Integer> k = new ArrayList<>();
        for (Map<String, String> row : read("reference_data.csv")) {
            if (row.get("dataset").equals(name)) {
                v.add(Double.parseDouble(row.get("value")));
                n.add(Integer.parseInt(row.get("trials")));
                k.add(Integer.parseInt(row.get("correct")));
            }
        }
        if (v.isEmpty()) {
            throw new IllegalStateException("no data set " + name);
        }
        return new BinomialData(v.stream().mapToDouble(Double::doubleValue).toArray(),
                n.stream().mapToInt(Integer::intValue).toArray(), k.stream().mapToInt(Integer::intValue).toArray());
    }

    static double number(Map<String, String> row, String column) {
        return Double.parseDouble(row.get(column));
    }
}

package io.github.eigengate.theory.curves;

import io.github.eigengate.arith.WeierstrassModel;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;

/** Reads the PARI/GP reference tables under src/test/resources/curves (written by fixtures-gp/curves-reference.gp). */
final class CurveFixtures {

    private CurveFixtures() {
    }

    static List<Map<String, String>> rows(String name) {
        try (InputStream in = CurveFixtures.class.getClassLoader().getResourceAsStream("curves/" + name);
             Reader r = new InputStreamReader(in, StandardCharsets.UTF_8)) {
            List<Map<String, String>> out = new ArrayList<>();
            for (CSVRecord rec : CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true)
                    .setCommentMarker('#').get().parse(r)) {
                out.add(rec.toMap());
            }
            return out;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static WeierstrassModel model(String cell) {
        String inner = cell.strip().substring(1, cell.strip().length() - 1);
        return WeierstrassModel.of(Arrays.stream(inner.split(",")).map(s -> new BigInteger(s.strip())).toList());
    }
}

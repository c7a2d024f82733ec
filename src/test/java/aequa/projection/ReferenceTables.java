package aequa.projection;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/** Reads the reference CSV files copied into src/test/resources/projection/ (see SOURCE.md there). */
final class ReferenceTables {

    private ReferenceTables() {
    }

    /** The data rows of a CSV file without quoting, split on commas; the header line is skipped. */
    static List<String[]> rows(String resource) {
        try (InputStream in = ReferenceTables.class.getResourceAsStream("/projection/" + resource)) {
            if (in == null) {
                throw new IllegalStateException("missing test resource projection/" + resource);
            }
            BufferedReader reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            List<String[]> rows = new ArrayList<>();
            reader.readLine();
            for (String line = reader.readLine(); line != null; line = reader.readLine()) {
                if (!line.isBlank()) {
                    rows.add(line.split(","));
                }
            }
            return rows;
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }

    /** Ellipsoids of the published worked examples (Snyder 1987, Appendix A; IOGP GN 7-2). */
    static final EllipsoidAxes GRS80 = EllipsoidAxes.fromInverseFlattening(6378137.0, 298.257222101);
    static final EllipsoidAxes CLARKE_1866 = new EllipsoidAxes(6378206.4, 6356583.8);
    static final EllipsoidAxes INTERNATIONAL_1924 = EllipsoidAxes.fromInverseFlattening(6378388.0, 297.0);
}

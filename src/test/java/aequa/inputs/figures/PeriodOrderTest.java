package aequa.inputs.figures;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;

/** Period labels sort oldest first, whatever order they arrive in. */
class PeriodOrderTest {

    @Test
    void numericRunsCompareByValue() {
        // ISO 8601 years and quarters as commonly written; quarter 10 does not exist but checks run length
        List<String> expected = List.of("FY9", "FY10", "1999", "2000", "2020-Q1", "2020-Q2", "2020-Q10", "2021");
        List<String> shuffled = new ArrayList<>(expected);
        Collections.shuffle(shuffled, new Random(42));
        shuffled.sort(PeriodOrder.OLDEST_FIRST);
        assertEquals(List.of("1999", "2000", "2020-Q1", "2020-Q2", "2020-Q10", "2021", "FY9", "FY10"), shuffled);
    }

    @Test
    void leadingZerosStillGiveATotalOrder() {
        assertEquals(-1, Integer.signum(PeriodOrder.OLDEST_FIRST.compare("07", "7")));
        assertEquals(1, Integer.signum(PeriodOrder.OLDEST_FIRST.compare("7", "07")));
        assertEquals(0, PeriodOrder.OLDEST_FIRST.compare("2020", "2020"));
        // digit runs longer than a long still compare by value
        assertEquals(-1, Integer.signum(PeriodOrder.OLDEST_FIRST.compare("99999999999999999999", "100000000000000000000")));
    }
}

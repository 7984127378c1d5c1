package org.stasissheet.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

class FlowChartTest {

    @Test
    @DisplayName("the first 25 series differ in line pattern and marker, not only in shade")
    void seriesStylesAreDistinct() {
        Set<String> pairs = new HashSet<>();
        for (int i = 0; i < 25; i++) {
            pairs.add((i % 5) + "/" + FlowChart.markerIndex(i));
        }
        assertEquals(25, pairs.size());
    }

    static IntStream seeds() {
        return IntStream.range(0, 40);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    @DisplayName("the y axis always holds every point and the reference line, with at most 7 ticks")
    void axisHoldsTheData(int seed) {
        SplittableRandom random = new SplittableRandom(1729L + seed);
        List<FlowChart.Point> points = new ArrayList<>();
        double max = 0;
        for (int i = 0; i < 16; i++) {
            double flow = Math.exp(random.nextDouble(-3, 3)); // relative flows from 0.05 to 20
            max = Math.max(max, flow);
            points.add(new FlowChart.Point(4 * Math.pow(250, i / 15.0), flow));
        }
        double top = FlowChart.niceMax(List.of(new FlowChart.Series("s", points)));
        double step = FlowChart.niceStep(top);
        assertTrue(top >= max && top >= 1.2, "top " + top + " for max " + max);
        assertTrue(top / step <= 7 + 1e-9, "ticks: " + top / step);
        // the top is a whole number of steps, so the last tick sits on the frame (tolerance: rounding of doubles)
        assertEquals(Math.round(top / step), top / step, 1e-9);
    }
}

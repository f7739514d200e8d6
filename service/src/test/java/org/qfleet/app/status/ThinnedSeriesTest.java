package org.qfleet.app.status;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import org.junit.jupiter.api.Test;

class ThinnedSeriesTest {

    @Test
    void neverHoldsMoreThanItsCapacityAndKeepsTheFirstAndTheNewestInOrder() {
        ThinnedSeries<Integer> series = new ThinnedSeries<>(10);
        for (int i = 1; i <= 1000; i++) {
            series.add(i);
            assertThat(series.size()).isLessThanOrEqualTo(10);
            List<Integer> points = series.toList();
            assertThat(points.get(0)).isEqualTo(1);
            assertThat(points.get(points.size() - 1)).isEqualTo(i);
            assertThat(points).isSorted().doesNotHaveDuplicates();
        }
    }

    @Test
    void keepsEveryPointUntilFull() {
        ThinnedSeries<Integer> series = new ThinnedSeries<>(8);
        for (int i = 0; i < 8; i++) {
            series.add(i);
        }
        assertThat(series.toList()).containsExactly(0, 1, 2, 3, 4, 5, 6, 7);
        series.add(8);
        assertThat(series.toList()).as("every second point dropped, the newest kept").containsExactly(0, 2, 4, 6, 7, 8);
    }

    @Test
    void refusesATinyCapacity() {
        assertThatThrownBy(() -> new ThinnedSeries<Integer>(2)).hasMessageContaining("at least 4");
    }
}

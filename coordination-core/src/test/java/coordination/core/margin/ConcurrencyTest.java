package coordination.core.margin;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.is;

import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.ConductorMaterial;
import coordination.core.cable.Insulation;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.curve.RandomDevices;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;

/** Devices, cables and checks are immutable: shared across threads they give the same answers. */
class ConcurrencyTest {
    @Test
    void sharedModelsGiveTheSameResultsOnEveryThread() throws Exception {
        SplittableRandom r = new SplittableRandom(99);
        List<ProtectiveDevice> devices = new ArrayList<>();
        for (int i = 0; i < 50; i++) {
            devices.add(RandomDevices.any(r));
        }
        CableThermalLimit cable = CableThermalLimit.of("C", ConductorMaterial.COPPER, Insulation.XLPE, 50, 1);
        List<Object> expected = new ArrayList<>();
        for (ProtectiveDevice d : devices) {
            expected.add(CableCheck.check(d, cable, 500, 20_000, MarginRequirement.seconds(0.1)));
            expected.add(GradingCheck.check(devices.get(0), d, 500, 20_000, GradingRequirement.intervalSeconds(0.3))
                    );
        }
        ExecutorService pool = Executors.newFixedThreadPool(8);
        try {
            List<Future<List<Object>>> futures = new ArrayList<>();
            for (int t = 0; t < 8; t++) {
                futures.add(pool.submit(() -> {
                    List<Object> got = new ArrayList<>();
                    for (ProtectiveDevice d : devices) {
                        got.add(CableCheck.check(d, cable, 500, 20_000, MarginRequirement.seconds(0.1)));
                        got.add(GradingCheck.check(devices.get(0), d, 500, 20_000,
                                GradingRequirement.intervalSeconds(0.3)));
                    }
                    return got;
                }));
            }
            for (Future<List<Object>> f : futures) {
                assertThat(f.get(), is(expected));
            }
        } finally {
            pool.shutdownNow();
        }
    }
}

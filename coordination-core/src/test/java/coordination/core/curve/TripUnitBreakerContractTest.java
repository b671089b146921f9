package coordination.core.curve;

import java.util.SplittableRandom;

class TripUnitBreakerContractTest extends TimeCurrentCurveContractTest {
    @Override
    ProtectiveDevice device(SplittableRandom random) {
        return RandomDevices.breaker(random);
    }

    @Override
    double lowestOperatingAmps(ProtectiveDevice device) {
        TripUnitBreaker.Settings s = ((TripUnitBreaker) device).settings();
        return s.irAmps() * s.longTimeLowMultiple();
    }
}

package coordination.core.curve;

import java.util.SplittableRandom;

class MiniatureBreakerContractTest extends TimeCurrentCurveContractTest {
    @Override
    ProtectiveDevice device(SplittableRandom random) {
        return RandomDevices.mcb(random);
    }

    @Override
    double lowestOperatingAmps(ProtectiveDevice device) {
        return ((MiniatureBreaker) device).ratedAmps() * 1.13;
    }
}

package coordination.core.curve;

import java.util.SplittableRandom;

class FuseContractTest extends TimeCurrentCurveContractTest {
    @Override
    ProtectiveDevice device(SplittableRandom random) {
        return RandomDevices.fuse(random);
    }

    @Override
    double lowestOperatingAmps(ProtectiveDevice device) {
        return device.minimumCurve().lowestDefinedAmps();
    }
}

package coordination.core.curve;

import java.util.SplittableRandom;

class RelayContractTest extends TimeCurrentCurveContractTest {
    @Override
    ProtectiveDevice device(SplittableRandom random) {
        return RandomDevices.relay(random);
    }

    @Override
    double lowestOperatingAmps(ProtectiveDevice device) {
        return ((InverseTimeStage) ((Relay) device).stages().get(0)).pickupAmps();
    }
}

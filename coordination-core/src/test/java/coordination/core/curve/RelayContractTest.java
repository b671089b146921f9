package coordination.core.curve;

import java.util.SplittableRandom;

class RelayContractTest extends TimeCurrentCurveContractTest {
    @Override
    ProtectiveDevice device(SplittableRandom random) {
        return RandomDevices.relay(random);
    }

    @Override
    double lowestOperatingAmps(ProtectiveDevice device) {
        // the fast edge may start below the setting by the stated pickup tolerance
        Relay relay = (Relay) device;
        return relay.tolerance().pickupAmps(((InverseTimeStage) relay.stages().get(0)).pickupAmps(), Edge.FAST);
    }
}

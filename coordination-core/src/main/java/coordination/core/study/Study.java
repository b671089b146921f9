package coordination.core.study;

import coordination.core.cable.CableThermalLimit;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.design.NoTrip;
import coordination.core.internal.Checks;
import coordination.core.internal.RecordForm;
import coordination.core.margin.DcOffset;
import coordination.core.margin.GradingRequirement;
import coordination.core.margin.MarginRequirement;
import java.io.Serial;
import java.io.Serializable;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * A coordination study read from a study file: its cables, devices and the checks to run, with
 * every current already in amperes at the study's reference voltage.
 *
 * @param name the study's file name without extension, used to name outputs
 * @param title the study title
 * @param voltageKv reference voltage of the chart in kV
 * @param frequencyHz system frequency in Hz
 * @param revision revision text, or empty
 * @param date date text as written in the study, or empty
 * @param page page size of the sheet
 * @param cables the cables
 * @param devices the devices
 * @param checks the checks
 * @param signOff the drawing number and the names of who prepared, checked and approved the study
 * @param network the network and its fault levels, if the study describes one
 */
public record Study(String name, String title, double voltageKv, double frequencyHz, String revision, String date,
        PageSize page, List<StudyCable> cables, List<StudyDevice> devices, List<StudyCheck> checks,
        SignOff signOff, Optional<StudyNetwork> network) implements Serializable {
    /** Optionals cannot be serialized: the record goes as its components. */
    @Serial
    private Object writeReplace() {
        return RecordForm.of(this);
    }

    /**
     * The sheet's sign-off block, each field empty where the study leaves it out (the sheet then
     * leaves a line to write on).
     *
     * @param drawing the drawing number
     * @param prepared who prepared the study
     * @param checked who checked it
     * @param approved who approved it
     */
    public record SignOff(String drawing, String prepared, String checked, String approved) implements Serializable {
        /** A block with every field empty. */
        public static final SignOff NONE = new SignOff("", "", "", "");

        /**
         * Requires every field, empty or not.
         *
         * @param drawing the drawing number
         * @param prepared who prepared the study
         * @param checked who checked it
         * @param approved who approved it
         */
        public SignOff {
            Checks.given("sign-off: drawing", drawing);
            Checks.given("sign-off: prepared", prepared);
            Checks.given("sign-off: checked", checked);
            Checks.given("sign-off: approved", approved);
        }
    }

    /** Where a device sits on its branch. */
    public enum End {
        /** A cable's sending end ({@code from}) or a transformer's HV terminals ({@code hv}). */
        FROM,
        /** A cable's receiving end ({@code to}) or a transformer's LV terminals ({@code lv}). */
        TO
    }

    /**
     * A device's place in the network.
     *
     * @param branch the cable or transformer it sits at
     * @param end which end
     */
    public record Placement(String branch, End end) implements Serializable {
    }

    /**
     * A derived pair the study declares as not meant to grade.
     *
     * @param upstream the upstream device
     * @param downstream the downstream device
     * @param reason why
     */
    public record Accepted(String upstream, String downstream, String reason) implements Serializable {
    }

    /**
     * The network of a study.
     *
     * @param network the buses, sources, transformers and cable branches
     * @param levels their fault levels
     * @param placements each placed device's branch and end, by device id
     * @param accepted derived pairs declared as not meant to grade
     * @param warnings what the derivation could not do (a cable without a protecting device, ...)
     */
    public record StudyNetwork(coordination.core.network.Network network, coordination.core.network.FaultLevels levels,
            java.util.Map<String, Placement> placements, List<Accepted> accepted, List<Note> warnings)
            implements Serializable {
        /**
         * Copies the collections in.
         *
         * @param network the buses, sources, transformers and cable branches
         * @param levels their fault levels
         * @param placements each placed device's branch and end, by device id
         * @param accepted derived pairs declared as not meant to grade
         * @param warnings what the derivation could not do (a cable without a protecting device, ...)
         */
        public StudyNetwork {
            placements = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(placements));
            accepted = List.copyOf(accepted);
            warnings = List.copyOf(warnings);
        }
    }

    /**
     * Copies the lists in.
     *
     * @param name the study's file name without extension, used to name outputs
     * @param title the study title
     * @param voltageKv reference voltage of the chart in kV
     * @param frequencyHz system frequency in Hz
     * @param revision revision text, or empty
     * @param date date text as written in the study, or empty
     * @param page page size of the sheet
     * @param cables the cables
     * @param devices the devices
     * @param checks the checks
     * @param signOff the drawing number and the names of who prepared, checked and approved the study
     * @param network the network and its fault levels, if the study describes one
     */
    public Study {
        Checks.given("study: sign-off", signOff);
        Checks.given("study: network", network);
        cables = List.copyOf(cables);
        devices = List.copyOf(devices);
        checks = List.copyOf(checks);
    }

    /**
     * The study with every check's current range scaled: the lowest current times one factor, the
     * highest times the other. Cables' stated fault ranges scale alike.
     *
     * @param minFactor positive factor on the lowest currents
     * @param maxFactor positive factor on the highest currents
     * @return the scaled study
     * @throws IllegalArgumentException if a scaled range is inverted or a factor is not positive
     */
    public Study withFaultFactors(double minFactor, double maxFactor) {
        Checks.positive("fault factor: minimum", minFactor, "");
        Checks.positive("fault factor: maximum", maxFactor, "");
        List<StudyCheck> scaled = new java.util.ArrayList<>();
        for (StudyCheck c : checks) {
            if (c instanceof CableCheckSpec cc) {
                scaled.add(new CableCheckSpec(cc.cable(), cc.device(), cc.requirement(),
                        cc.range().scaled(minFactor, maxFactor), cc.dcOffset(), cc.dcSource(), cc.derived(),
                        cc.faultCase(), cc.conductorShare()));
            } else if (c instanceof GradingCheckSpec g) {
                scaled.add(new GradingCheckSpec(g.upstream(), g.downstream(), g.requirement(),
                        g.range().scaled(minFactor, maxFactor), g.derived(), g.faultCase(), g.upstreamScale()));
            }
        }
        List<StudyCable> cs = new java.util.ArrayList<>();
        for (StudyCable c : cables) {
            cs.add(new StudyCable(c.limit(), c.sizeText(), c.fault().map(r -> r.scaled(minFactor, maxFactor)),
                    c.initialSource(), c.finalSource()));
        }
        return new Study(name, title, voltageKv, frequencyHz, revision, date, page, cs, devices, scaled, signOff,
                network);
    }

    /** Sheet page sizes. */
    public enum PageSize {
        /** ISO A4 landscape, 297 mm x 210 mm. */
        A4("a4", 297.0, 210.0),
        /** US Letter landscape, 11 in x 8.5 in. */
        LETTER("letter", 279.4, 215.9);

        private final String key;
        private final double widthMm;
        private final double heightMm;

        PageSize(String key, double widthMm, double heightMm) {
            this.key = key;
            this.widthMm = widthMm;
            this.heightMm = heightMm;
        }

        /** @return the study-file word, {@code a4} or {@code letter} */
        public String key() {
            return key;
        }

        /** @return landscape width in mm */
        public double widthMm() {
            return widthMm;
        }

        /** @return landscape height in mm */
        public double heightMm() {
            return heightMm;
        }
    }

    /**
     * A range of prospective fault currents.
     *
     * @param fromAmps lowest current in amperes, above 0
     * @param toAmps highest current in amperes, at or above {@code fromAmps}
     */
    public record CurrentRange(double fromAmps, double toAmps) implements Serializable {
        /**
         * Validates the range.
         *
         * @param fromAmps lowest current in amperes, above 0
         * @param toAmps highest current in amperes, at or above {@code fromAmps}
         * @throws IllegalArgumentException if an end is not positive or the range is inverted
         */
        public CurrentRange {
            Checks.currentRange("current range", fromAmps, toAmps);
        }

        /**
         * The range widened or narrowed.
         *
         * @param minFactor factor on the lowest current
         * @param maxFactor factor on the highest current
         * @return the scaled range
         */
        public CurrentRange scaled(double minFactor, double maxFactor) {
            return new CurrentRange(fromAmps * minFactor, toAmps * maxFactor);
        }
    }

    /** Where a cable's conductor temperature came from. */
    public enum TemperatureSource {
        /** Given in the study. */
        STATED,
        /** Computed from the load the cable carries. */
        FROM_LOAD,
        /** The insulation's default, not given in the study. */
        INSULATION_DEFAULT
    }

    /**
     * A cable of the study.
     *
     * @param limit its thermal limit
     * @param sizeText its size as written (e.g. {@code 70 mm²}, {@code 4/0 AWG})
     * @param fault prospective fault currents, if the study gives them
     * @param initialSource where the initial temperature came from
     * @param finalSource where the final temperature came from
     */
    public record StudyCable(CableThermalLimit limit, String sizeText, Optional<CurrentRange> fault,
            TemperatureSource initialSource, TemperatureSource finalSource) implements Serializable {
        /** Optionals cannot be serialized: the record goes as its components. */
        @Serial
        private Object writeReplace() {
            return RecordForm.of(this);
        }

        /** @return the cable's id */
        public String id() {
            return limit.id();
        }
    }

    /**
     * A device of the study.
     *
     * @param device the device as set, currents at its own voltage
     * @param voltageKv its voltage level in kV
     * @param referralFactor the factor its currents are multiplied by at the study's reference voltage
     * @param referred the device with currents at the study's reference voltage
     * @param assumptions the defaults its model rests on, where the study states no value
     * @param limits what a design proposal for its settings must respect
     */
    public record StudyDevice(ProtectiveDevice device, double voltageKv, double referralFactor,
            ProtectiveDevice referred, List<Note> assumptions, DesignLimits limits) implements Serializable {
        /**
         * Copies the list in.
         *
         * @param device the device as set, currents at its own voltage
         * @param voltageKv its voltage level in kV
         * @param referralFactor the factor its currents are multiplied by at the study's reference voltage
         * @param referred the device with currents at the study's reference voltage
         * @param assumptions the defaults its model rests on, where the study states no value
         * @param limits what a design proposal for its settings must respect
         */
        public StudyDevice {
            assumptions = List.copyOf(assumptions);
        }

        /** @return the device's id */
        public String id() {
            return device.id();
        }
    }

    /** A check to run. */
    public sealed interface StudyCheck extends Serializable permits CableCheckSpec, GradingCheckSpec {
    }

    /**
     * What design proposals for a relay's settings must respect beside its cable.
     *
     * @param loadAmps the full-load current in primary amperes, if stated
     * @param noTrip currents the relay must ride through
     * @param sensitivityFactor the lowest fault current over the pickup must reach at least this
     * @param pickupStepAmps resolution of the first inverse-time stage's pickup, in its setting's amperes
     */
    public record DesignLimits(OptionalDouble loadAmps, List<NoTrip> noTrip, double sensitivityFactor,
            double pickupStepAmps) implements Serializable {
        /** Optionals cannot be serialized: the record goes as its components. */
        @Serial
        private Object writeReplace() {
            return RecordForm.of(this);
        }

        /** Pickup over full-load current at least this: 1.25 (common practice). */
        public static final double LOAD_FACTOR = 1.25;
        /** Lowest fault current over pickup at least this: 1.5 (common practice). */
        public static final double DEFAULT_SENSITIVITY_FACTOR = 1.5;
        /** Pickup step of settings in primary amperes: 1 A (common practice). */
        public static final double DEFAULT_PICKUP_STEP_A = 1.0;
        /** Pickup step of settings in secondary amperes: 0.01 A (common practice, from memory). */
        public static final double DEFAULT_SECONDARY_PICKUP_STEP_A = 0.01;
        /** No limits: for devices other than relays. */
        public static final DesignLimits NONE = new DesignLimits(OptionalDouble.empty(), List.of(),
                DEFAULT_SENSITIVITY_FACTOR, DEFAULT_PICKUP_STEP_A);

        /**
         * Copies the list in.
         *
         * @param loadAmps the full-load current in primary amperes, if stated
         * @param noTrip currents the relay must ride through
         * @param sensitivityFactor the lowest fault current over the pickup must reach at least this
         * @param pickupStepAmps resolution of the first inverse-time stage's pickup, in its setting's amperes
         */
        public DesignLimits {
            noTrip = List.copyOf(noTrip);
        }
    }

    /** Where a cable check's DC-offset heating comes from. */
    public enum DcSource {
        /** A κ stated in the study. */
        STATED_KAPPA,
        /** κ from an X/R stated in the study (IEC 60909-0). */
        FROM_X_R,
        /** Neither stated: κ {@value DcOffset#ASSUMED_KAPPA} assumed. */
        ASSUMED_KAPPA,
        /** κ from the network's R/X at the cable's sending end (IEC 60909-0, eq. 55). */
        FROM_NETWORK,
        /** Switched off by the study. */
        NONE
    }

    /**
     * A cable check.
     *
     * @param cable cable id
     * @param device device id
     * @param requirement the margin asked for
     * @param range the fault currents checked
     * @param dcOffset DC-offset heating, unless switched off
     * @param dcSource where the heating's κ came from
     * @param derived whether the network implied the check (rather than the study's checks list)
     * @param faultCase empty, or for a fault inside one of a cable's parallel conductors where it lies
     * @param conductorShare the faulted conductor's share of the device's current (1 for a check of
     *     the whole cable); with a share below one the check is of one conductor, its range that
     *     conductor's currents
     */
    public record CableCheckSpec(String cable, String device, MarginRequirement requirement, CurrentRange range,
            Optional<DcOffset> dcOffset, DcSource dcSource, boolean derived, String faultCase,
            double conductorShare) implements StudyCheck {
        /** Optionals cannot be serialized: the record goes as its components. */
        @Serial
        private Object writeReplace() {
            return RecordForm.of(this);
        }

        /**
         * A check of the whole cable.
         *
         * @param cable cable id
         * @param device device id
         * @param requirement the margin
         * @param range the fault currents
         * @param dcOffset DC-offset heating
         * @param dcSource where its κ came from
         * @param derived whether the network implied it
         */
        public CableCheckSpec(String cable, String device, MarginRequirement requirement, CurrentRange range,
                Optional<DcOffset> dcOffset, DcSource dcSource, boolean derived) {
            this(cable, device, requirement, range, dcOffset, dcSource, derived, "", 1.0);
        }

        /**
         * A check written in the study.
         *
         * @param cable cable id
         * @param device device id
         * @param requirement the margin
         * @param range the fault currents
         * @param dcOffset DC-offset heating
         * @param dcSource where its κ came from
         */
        public CableCheckSpec(String cable, String device, MarginRequirement requirement, CurrentRange range,
                Optional<DcOffset> dcOffset, DcSource dcSource) {
            this(cable, device, requirement, range, dcOffset, dcSource, false);
        }
    }

    /**
     * A grading check.
     *
     * @param upstream upstream device id
     * @param downstream downstream device id
     * @param requirement what is asked
     * @param range the currents both devices see, as the downstream device sees them
     * @param derived whether the network implied the check
     * @param faultCase empty, or for a pair across a delta-star transformer {@code three-phase} or
     *     {@code phase-to-phase}
     * @param upstreamScale factor of the upstream device's current over the downstream device's: 2/√3
     *     for an LV phase-to-phase fault seen through a delta-star transformer, else 1
     */
    public record GradingCheckSpec(String upstream, String downstream, GradingRequirement requirement,
            CurrentRange range, boolean derived, String faultCase, double upstreamScale) implements StudyCheck {
        /**
         * A check written in the study.
         *
         * @param upstream upstream device id
         * @param downstream downstream device id
         * @param requirement what is asked
         * @param range the currents
         */
        public GradingCheckSpec(String upstream, String downstream, GradingRequirement requirement,
                CurrentRange range) {
            this(upstream, downstream, requirement, range, false, "", 1.0);
        }
    }

    /**
     * Finds a cable.
     *
     * @param id its id
     * @return the cable
     * @throws IllegalArgumentException if the study has no cable of that id
     */
    public StudyCable cable(String id) {
        return cables.stream().filter(c -> c.id().equals(id)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("study '" + name + "': no cable has the id '" + id + "'"));
    }

    /**
     * Finds a device.
     *
     * @param id its id
     * @return the device
     * @throws IllegalArgumentException if the study has no device of that id
     */
    public StudyDevice device(String id) {
        return devices.stream().filter(d -> d.id().equals(id)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("study '" + name + "': no device has the id '" + id
                        + "'"));
    }
}

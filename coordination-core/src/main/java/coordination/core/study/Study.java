package coordination.core.study;

import coordination.core.cable.CableThermalLimit;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.margin.DcOffset;
import coordination.core.margin.GradingRequirement;
import coordination.core.margin.MarginRequirement;
import java.util.List;

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
 */
public record Study(String name, String title, double voltageKv, double frequencyHz, String revision, String date,
        PageSize page, List<StudyCable> cables, List<StudyDevice> devices, List<StudyCheck> checks) {

    /** Copies the lists in. */
    public Study {
        cables = List.copyOf(cables);
        devices = List.copyOf(devices);
        checks = List.copyOf(checks);
    }

    /** Sheet page sizes. */
    public enum PageSize {
        /** ISO A4 landscape, 297 mm x 210 mm. */
        A4(297.0, 210.0),
        /** US Letter landscape, 11 in x 8.5 in. */
        LETTER(279.4, 215.9);

        private final double widthMm;
        private final double heightMm;

        PageSize(double widthMm, double heightMm) {
            this.widthMm = widthMm;
            this.heightMm = heightMm;
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
     * A cable of the study.
     *
     * @param limit its thermal limit
     * @param sizeText its size as written (e.g. {@code 70 mm²}, {@code 4/0 AWG})
     * @param faultMinAmps lowest prospective fault current in amperes, or NaN if not given
     * @param faultMaxAmps highest prospective fault current in amperes, or NaN if not given
     */
    public record StudyCable(CableThermalLimit limit, String sizeText, double faultMinAmps, double faultMaxAmps) {
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
     * @param referred the device with currents at the study's reference voltage
     * @param settings one line per setting, for the sheet's settings table
     */
    public record StudyDevice(ProtectiveDevice device, double voltageKv, ProtectiveDevice referred,
            List<String> settings) {
        /** Copies the list in. */
        public StudyDevice {
            settings = List.copyOf(settings);
        }

        /** @return the device's id */
        public String id() {
            return device.id();
        }
    }

    /** A check to run. */
    public sealed interface StudyCheck permits CableCheckSpec, GradingCheckSpec {
    }

    /**
     * A cable check.
     *
     * @param cable cable id
     * @param device device id
     * @param requirement the margin asked for
     * @param fromAmps lowest current of the range in amperes
     * @param toAmps highest current in amperes
     * @param dcOffset DC-offset heating, or null
     */
    public record CableCheckSpec(String cable, String device, MarginRequirement requirement, double fromAmps,
            double toAmps, DcOffset dcOffset) implements StudyCheck {
    }

    /**
     * A grading check.
     *
     * @param upstream upstream device id
     * @param downstream downstream device id
     * @param requirement what is asked
     * @param fromAmps lowest current in amperes
     * @param toAmps highest current in amperes
     */
    public record GradingCheckSpec(String upstream, String downstream, GradingRequirement requirement,
            double fromAmps, double toAmps) implements StudyCheck {
    }

    /**
     * Finds a cable.
     *
     * @param id its id
     * @return the cable, or null
     */
    public StudyCable cable(String id) {
        return cables.stream().filter(c -> c.id().equals(id)).findFirst().orElse(null);
    }

    /**
     * Finds a device.
     *
     * @param id its id
     * @return the device, or null
     */
    public StudyDevice device(String id) {
        return devices.stream().filter(d -> d.id().equals(id)).findFirst().orElse(null);
    }
}

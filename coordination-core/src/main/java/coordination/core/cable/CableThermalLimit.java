package coordination.core.cable;

import coordination.core.CoordinationException;
import coordination.core.internal.Checks;
import java.io.Serializable;
import java.util.Optional;

/**
 * The short-circuit thermal limit of a cable: how long its conductors may carry a current before
 * they reach their final temperature.
 *
 * <p>Adiabatic (IEC 60949, clause 3): {@code I²t = k²S²}, so the damage time is
 * {@code t(I) = k²S²/I²} and the withstand current {@code I(t) = kS/√t}, with S the total
 * cross-section of the parallel conductors. The method is valid for faults of about 0.1 s to 5 s
 * (common practice); {@link #ADIABATIC_MIN_SECONDS} and {@link #ADIABATIC_MAX_SECONDS} carry that
 * window for charts and checks.
 *
 * <p>Non-adiabatic (IEC 60949, clause 6, simplified method for conductors):
 * {@code I = ε × I_ad}, {@code ε = √(1 + X√(t/S) + Y(t/S))}, with S the cross-section of one
 * conductor. IEC 60949 covers short circuits of up to 5 s, so the heat lost to the insulation is
 * credited only that far: where the non-adiabatic time would exceed 5 s, the cable is taken to
 * withstand the current for 5 s or for its adiabatic time, whichever is longer. The adiabatic time
 * is the conservative bound beyond the standard's scope, and 5 s is what the standard itself
 * shows the cable reaches. The constants held are those for cables up to 3 kV. ICEA P-32-382: {@code (I/A)² t = C × log10((T2 + β)/(T1 + β))}, A in circular mils.
 *
 * @param id identifier
 * @param material conductor material
 * @param insulation insulation type
 * @param sizeMm2 cross-section of one conductor in mm², above 0
 * @param parallel conductors in parallel per phase, 1 or more
 * @param initialCelsius conductor temperature when the fault starts, °C
 * @param finalCelsius permitted conductor temperature at the end of the fault, °C, above the initial
 * @param method how the limit is computed
 */
public record CableThermalLimit(String id, ConductorMaterial material, Insulation insulation, double sizeMm2,
        int parallel, double initialCelsius, double finalCelsius, ThermalMethod method) implements Serializable {

    /** Shortest fault duration for which the adiabatic limit is used, 0.1 s (common practice). */
    public static final double ADIABATIC_MIN_SECONDS = 0.1;
    /** Longest fault duration for which the adiabatic limit is used, 5 s (common practice). */
    public static final double ADIABATIC_MAX_SECONDS = 5.0;

    /**
     * Validates the cable.
     *
     * @param id identifier
     * @param material conductor material
     * @param insulation insulation type
     * @param sizeMm2 cross-section of one conductor in mm², above 0
     * @param parallel conductors in parallel per phase, 1 or more
     * @param initialCelsius conductor temperature when the fault starts, °C
     * @param finalCelsius permitted conductor temperature at the end of the fault, °C, above the initial
     * @param method how the limit is computed
     * @throws IllegalArgumentException if the size, parallel count or temperatures are out of range
     */
    public CableThermalLimit {
        Checks.given("cable: id", id);
        String who = "cable '" + id + "'";
        if (material == null || insulation == null || method == null) {
            throw new IllegalArgumentException(who + ": material, insulation and method must be given");
        }
        Checks.positive(who + ": size", sizeMm2, "mm2");
        if (parallel < 1) {
            throw new IllegalArgumentException(who + ": parallel conductors: found " + parallel + " - must be 1 or more");
        }
        Checks.inRange(who + ": initial temperature", initialCelsius, -50, 400, "°C");
        Checks.inRange(who + ": final temperature", finalCelsius, -50, 1000, "°C");
        temperatureProblem(initialCelsius, finalCelsius).ifPresent(p -> {
            throw new IllegalArgumentException(who + ": " + p);
        });
        if (method == ThermalMethod.NON_ADIABATIC && Double.isNaN(insulation.nonAdiabaticX(material))) {
            throw new IllegalArgumentException(who + ": the non-adiabatic method has no constants for "
                    + material.key() + " in " + insulation.key() + " insulation - use adiabatic");
        }
    }

    /**
     * The rule that a conductor's initial temperature lies below its final one, as a message.
     *
     * @param initialCelsius temperature at the start of the fault, °C
     * @param finalCelsius permitted temperature at its end, °C
     * @return what is wrong, or empty when the final temperature is above the initial one
     */
    public static Optional<String> temperatureProblem(double initialCelsius, double finalCelsius) {
        if (finalCelsius > initialCelsius) {
            return Optional.empty();
        }
        return Optional.of("initial temperature " + Checks.format(initialCelsius)
                + " °C is not below the final temperature " + Checks.format(finalCelsius)
                + " °C - the initial temperature must be below the final one");
    }

    /**
     * A cable at the insulation's default temperatures (maximum operating to short-circuit limit),
     * adiabatic.
     *
     * @param id identifier
     * @param material conductor material
     * @param insulation insulation
     * @param sizeMm2 cross-section of one conductor in mm²
     * @param parallel conductors in parallel
     * @return the cable
     */
    public static CableThermalLimit of(String id, ConductorMaterial material, Insulation insulation, double sizeMm2,
            int parallel) {
        return new CableThermalLimit(id, material, insulation, sizeMm2, parallel, insulation.maxOperatingCelsius(),
                insulation.shortCircuitCelsius(sizeMm2), ThermalMethod.ADIABATIC);
    }

    /**
     * Conductor temperature before the fault from the load it carries (common practice):
     * {@code θi = θa + (θmax - θa) (I_load / I_z)²}.
     *
     * @param ambientCelsius ambient temperature, °C
     * @param maxOperatingCelsius conductor temperature at the rated current, °C
     * @param loadAmps load current in amperes, 0 or more
     * @param ratedAmps current-carrying capacity I_z in amperes, above 0
     * @return the initial temperature in °C
     * @throws IllegalArgumentException if the currents are out of range
     */
    public static double initialFromLoad(double ambientCelsius, double maxOperatingCelsius, double loadAmps,
            double ratedAmps) {
        Checks.nonNegative("load current", loadAmps, "A");
        Checks.positive("current-carrying capacity", ratedAmps, "A");
        double r = loadAmps / ratedAmps;
        return ambientCelsius + (maxOperatingCelsius - ambientCelsius) * r * r;
    }

    /** @return total conductor cross-section per phase in mm² */
    public double totalMm2() {
        return sizeMm2 * parallel;
    }

    /** @return adiabatic factor k in A·s^½/mm², from IEC 60949 (or from ICEA's constants for that method) */
    public double k() {
        if (method == ThermalMethod.ICEA) {
            // (I/A_cmil)² t = C log10(..) rearranged to the per-mm² form k² = C log10(..) / (mm²/cmil)²
            double ratio = (finalCelsius + material.iceaBeta()) / (initialCelsius + material.iceaBeta());
            return Math.sqrt(material.iceaConstant() * Math.log10(ratio)) / ConductorSizes.MM2_PER_CMIL;
        }
        return material.k(initialCelsius, finalCelsius);
    }

    /** @return the adiabatic let-through limit k²S² in A²s, S the total cross-section */
    public double i2tA2s() {
        double ks = k() * totalMm2();
        return ks * ks;
    }

    /**
     * Time for which the cable withstands a current before reaching its final temperature.
     *
     * @param amps fault current per phase in amperes, above 0
     * @return time in seconds
     * @throws IllegalArgumentException if the current is not above 0
     */
    public double damageSeconds(double amps) {
        if (!(amps > 0) || !Double.isFinite(amps)) {
            Checks.positive("cable '" + id + "': current", amps, "A");
        }
        double adiabatic = i2tA2s() / (amps * amps);
        if (method != ThermalMethod.NON_ADIABATIC) {
            return adiabatic;
        }
        double t = nonAdiabaticSeconds(amps);
        return t <= ADIABATIC_MAX_SECONDS ? t : Math.max(ADIABATIC_MAX_SECONDS, adiabatic);
    }

    /**
     * Whether the limit at a current lies beyond IEC 60949's scope, where the non-adiabatic gain is
     * no longer credited.
     *
     * @param amps current in amperes, above 0
     * @return true for the non-adiabatic method where its time would exceed 5 s
     */
    public boolean beyondNonAdiabaticScope(double amps) {
        return method == ThermalMethod.NON_ADIABATIC && nonAdiabaticSeconds(amps) > ADIABATIC_MAX_SECONDS;
    }

    /**
     * Currents, ascending, at which the damage curve has a kink: for the non-adiabatic method, where
     * its time reaches 5 s and where the adiabatic time does. The margin engine splits there.
     *
     * @return amperes, possibly none
     */
    public double[] breakpointsAmps() {
        if (method != ThermalMethod.NON_ADIABATIC) {
            return new double[0];
        }
        double adiabatic5 = k() * totalMm2() / Math.sqrt(ADIABATIC_MAX_SECONDS);
        return new double[] {adiabatic5, adiabatic5 * nonAdiabaticFactor(ADIABATIC_MAX_SECONDS)};
    }

    // per conductor, solve k²S²(1 + X u/√S + Y u²/S) = I² u² for u = √t (a quadratic in u)
    private double nonAdiabaticSeconds(double amps) {
        double s = sizeMm2;
        double i = amps / parallel;
        double k2s2 = Math.pow(k() * s, 2);
        double x = insulation.nonAdiabaticX(material);
        double y = insulation.nonAdiabaticY(material);
        double a = i * i - k2s2 * y / s;
        if (!(a > 0)) {
            return Double.POSITIVE_INFINITY;
        }
        double b = k2s2 * x / Math.sqrt(s);
        double u = (b + Math.sqrt(b * b + 4 * a * k2s2)) / (2 * a);
        return u * u;
    }

    /**
     * Current the cable withstands for a given duration; beyond 5 s the non-adiabatic method
     * credits no heat loss (see the class description).
     *
     * @param seconds fault duration in seconds, above 0
     * @return current per phase in amperes
     * @throws IllegalArgumentException if the duration is not above 0
     */
    public double withstandAmps(double seconds) {
        Checks.positive("cable '" + id + "': duration", seconds, "s");
        double adiabatic = k() * totalMm2() / Math.sqrt(seconds);
        return method == ThermalMethod.NON_ADIABATIC && seconds <= ADIABATIC_MAX_SECONDS
                ? adiabatic * nonAdiabaticFactor(seconds) : adiabatic;
    }

    /**
     * The non-adiabatic factor ε of IEC 60949 for this cable's conductors and a duration, whatever
     * the method chosen.
     *
     * @param seconds fault duration in seconds
     * @return ε, 1 or more
     * @throws CoordinationException if the library holds no constants for this insulation
     */
    public double nonAdiabaticFactor(double seconds) {
        double x = insulation.nonAdiabaticX(material);
        if (Double.isNaN(x)) {
            throw new CoordinationException("cable '" + id + "': no non-adiabatic constants for " + insulation.key());
        }
        double r = seconds / sizeMm2;
        return Math.sqrt(1 + x * Math.sqrt(r) + insulation.nonAdiabaticY(material) * r);
    }

    /**
     * This cable with another number of parallel conductors.
     *
     * @param n conductors per phase, 1 or more
     * @return the new cable
     */
    public CableThermalLimit withParallel(int n) {
        return new CableThermalLimit(id, material, insulation, sizeMm2, n, initialCelsius, finalCelsius, method);
    }

    /**
     * This cable with another conductor size, keeping its temperatures.
     *
     * @param mm2 cross-section of one conductor in mm²
     * @return the new cable
     */
    public CableThermalLimit withSizeMm2(double mm2) {
        return new CableThermalLimit(id, material, insulation, mm2, parallel, initialCelsius, finalCelsius, method);
    }

    /**
     * This cable with another method.
     *
     * @param m the method
     * @return the new cable
     */
    public CableThermalLimit withMethod(ThermalMethod m) {
        return new CableThermalLimit(id, material, insulation, sizeMm2, parallel, initialCelsius, finalCelsius, m);
    }
}

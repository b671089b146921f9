package coordination.core.curve;

/** A smooth, falling curve whose current at a given time can be solved in closed form. */
interface Invertible extends TimeCurrentCurve {
    /**
     * The current at which the curve reaches a time.
     *
     * @param seconds a time in seconds
     * @return amperes, or NaN where no current gives that time
     */
    double currentAtSeconds(double seconds);
}

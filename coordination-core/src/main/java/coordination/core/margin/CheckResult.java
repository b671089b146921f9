package coordination.core.margin;

import java.io.Serializable;

/**
 * The outcome of one check of a study, whatever its kind. Every kind is a record in this package;
 * a consumer switches over them with pattern matching instead of casting.
 */
public sealed interface CheckResult extends Serializable permits CableCheckResult, GradingCheckResult {

    /** @return whether the check passes */
    boolean pass();

    /** @return lower end of the checked current range in amperes */
    double fromAmps();

    /** @return upper end of the checked current range in amperes */
    double toAmps();

    /** @return a one-line explanation of the verdict */
    String reason();

    /** @return currents where the two compared curves cross, ascending, in amperes */
    double[] crossingsAmps();
}

package coordination.core.study;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * A network study seen one path at a time: from the source to each load-end bus, the devices and
 * cables on the path and the checks among them, as a study of its own for a sheet per path.
 */
public final class StudyPaths {
    private StudyPaths() {
    }

    /**
     * The paths of a study.
     *
     * @param study a study
     * @return one study per path from the source to a load end, named {@code NAME.path-N} and
     *     titled with the load end; empty for a study without a network
     */
    public static List<Study> of(Study study) {
        if (study.network().isEmpty()) {
            return List.of();
        }
        Study.StudyNetwork net = study.network().get();
        Map<String, Study.StudyDevice> devices = new LinkedHashMap<>();
        study.devices().forEach(d -> devices.put(d.id(), d));
        Map<String, Study.StudyCable> cables = new LinkedHashMap<>();
        study.cables().forEach(c -> cables.put(c.id(), c));
        Derivation d = new Derivation(net, devices, cables, study.voltageKv(), study.frequencyHz(), null);
        List<Study> out = new ArrayList<>();
        int n = 1;
        for (Derivation.Route r : d.routes()) {
            Set<String> onPath = new HashSet<>(r.devices());
            Set<String> cablesOn = new HashSet<>(r.branches());
            List<Study.StudyCheck> checks = new ArrayList<>();
            for (Study.StudyCheck c : study.checks()) {
                if (c instanceof Study.CableCheckSpec cc && cablesOn.contains(cc.cable()) && onPath.contains(cc.device())
                        || c instanceof Study.GradingCheckSpec g && onPath.contains(g.upstream())
                        && onPath.contains(g.downstream())) {
                    checks.add(c);
                }
            }
            out.add(new Study(study.name() + ".path-" + n++, study.title() + " - path to " + r.leaf(),
                    study.voltageKv(), study.frequencyHz(), study.revision(), study.date(), study.page(),
                    study.cables().stream().filter(c -> cablesOn.contains(c.id())).toList(),
                    study.devices().stream().filter(x -> onPath.contains(x.id())).toList(), checks, study.signOff(),
                    study.network()));
        }
        return out;
    }
}

package org.shutline.plan;

import java.util.List;
import java.util.Map;
import java.util.Set;
import org.yaml.snakeyaml.nodes.Node;
import org.yaml.snakeyaml.nodes.ScalarNode;

/** The step kinds of the plan file and how each one's value is read. */
final class StepKinds {
    static final Set<String> KEYS = Set.of("close", "open", "cut", "tie_in", "activate", "abandon",
            "bypass_install", "bypass_remove", "transfer", "move_tap", "station_out", "station_in", "attend");

    private final PlanReader r;

    StepKinds(PlanReader r) {
        this.r = r;
    }

    StepAction action(String kind, Node v, boolean ordered) throws PlanException {
        switch (kind) {
            case "close": return new StepAction.CloseValves(r.ids(v, "close"), ordered);
            case "open": return new StepAction.OpenValves(r.ids(v, "open"));
            case "activate": return new StepAction.ActivateMain(r.scalar(v, "activate"));
            case "abandon": return new StepAction.AbandonMain(r.scalar(v, "abandon"));
            case "bypass_remove": return new StepAction.RemoveBypass(r.scalar(v, "bypass_remove"));
            case "station_out": return new StepAction.StationOut(r.scalar(v, "station_out"));
            case "station_in": return new StepAction.StationIn(r.scalar(v, "station_in"));
            case "cut": {
                Map<String, Node> m = r.mapping(v, "cut", Set.of("main", "at"));
                return new StepAction.CutMain(r.requiredText(m, "main", v), r.point(required(m, "at", v), "cut.at"));
            }
            case "tie_in": {
                Map<String, Node> m = r.mapping(v, "tie_in", Set.of("main", "to", "at"));
                return new StepAction.TieIn(r.requiredText(m, "main", v), r.requiredText(m, "to", v),
                        r.point(required(m, "at", v), "tie_in.at"));
            }
            case "bypass_install": {
                Map<String, Node> m = r.mapping(v, "bypass_install", Set.of("id", "from", "to", "valves"));
                List<String> valves = m.containsKey("valves") ? r.ids(m.get("valves"), "bypass_install.valves") : List.of();
                return new StepAction.InstallBypass(r.requiredText(m, "id", v), r.point(required(m, "from", v), "bypass_install.from"),
                        r.point(required(m, "to", v), "bypass_install.to"), valves);
            }
            case "transfer": {
                Map<String, Node> m = r.mapping(v, "transfer", Set.of("from", "to", "services"));
                List<String> services = List.of();
                Node s = m.get("services");
                if (s != null && !(s instanceof ScalarNode sn && sn.getValue().trim().equals("all"))) {
                    services = r.ids(s, "transfer.services");
                }
                return new StepAction.TransferServices(r.requiredText(m, "from", v), r.requiredText(m, "to", v), services);
            }
            case "attend": {
                if (v instanceof ScalarNode) return new StepAction.Attend(r.scalar(v, "attend"), null);
                Map<String, Node> m = r.mapping(v, "attend", Set.of("station", "until"));
                Integer until = null;
                if (m.containsKey("until")) {
                    String u = r.scalar(m.get("until"), "attend.until");
                    try {
                        until = Integer.valueOf(u.trim());
                    } catch (NumberFormatException e) {
                        throw r.error(PlanReader.line(m.get("until")), "attend.until must be a step number, not '" + u + "'");
                    }
                }
                return new StepAction.Attend(r.requiredText(m, "station", v), until);
            }
            case "move_tap": {
                Map<String, Node> m = r.mapping(v, "move_tap", Set.of("tap", "to", "at"));
                XY at = m.containsKey("at") ? r.point(m.get("at"), "move_tap.at") : null;
                return new StepAction.MoveTap(r.requiredText(m, "tap", v), r.requiredText(m, "to", v), at);
            }
            default:
                throw r.error(PlanReader.line(v), "unknown step kind '" + kind + "'");
        }
    }

    private Node required(Map<String, Node> m, String key, Node owner) throws PlanException {
        Node n = m.get(key);
        if (n == null) throw r.error(PlanReader.line(owner), "missing key '" + key + "'");
        return n;
    }
}

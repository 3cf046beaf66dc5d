package plumbline.model;

import java.util.List;

/** A named load case (format reference (src/site/markdown/formats.md) section 2). */
public record LoadCase(String name, String type, boolean selfWeight, boolean pattern,
                       List<MemberLoad> memberLoads, List<NodeLoad> nodeLoads,
                       List<Temperature> temperatures, List<Settlement> settlements, SourceRef at) {
    public LoadCase {
        memberLoads = List.copyOf(memberLoads);
        nodeLoads = List.copyOf(nodeLoads);
        temperatures = List.copyOf(temperatures);
        settlements = List.copyOf(settlements);
    }

    public static final List<String> TYPES = List.of("dead", "live", "roof-live", "snow", "rain", "wind",
            "seismic", "thermal", "settlement", "other");
}

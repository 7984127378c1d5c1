package org.stasissheet.flow;

import java.util.List;

/** What every flow estimate leaves out. Shown wherever a flow number is shown, in these words. */
public final class FlowCaveats {
    private FlowCaveats() {
    }

    public static final List<String> ALL = List.of(
            "Paraproteins make red cells clump together when blood moves slowly; the viscosity laws used here "
                    + "hold for brisk flow and leave that clumping out, so slow-flow regions may fare worse.",
            "White cells sticking to vessel walls and plugging small vessels are not modelled; the leukocrit line "
                    + "only adds their volume to the red cells'.",
            "Vessel tone and the body's own control of blood flow are left out: pressure and vessel size are "
                    + "held fixed.",
            "These figures show the direction and rough size of a change; they are an illustration, not a "
                    + "measurement, and must not decide treatment on their own.");
}

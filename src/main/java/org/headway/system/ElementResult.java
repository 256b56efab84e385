package org.headway.system;

import java.util.List;
import java.util.Objects;
import org.headway.caution.Caution;

/**
 * An element's law evaluated at one flow.
 *
 * @param id the element's id
 * @param kind the element's kind ({@code pipe}, {@code valve}, …)
 * @param flow volumetric flow, positive inlet → outlet (m³/s)
 * @param headLoss head lost inlet → outlet (m); negative for a pump
 * @param pressureDrop ρ g × head loss (Pa)
 * @param law the law used, in words, with its source
 * @param cautions cautions, each naming the element
 */
public record ElementResult(
        String id, String kind, double flow, double headLoss, double pressureDrop, String law, List<Caution> cautions) {

    public ElementResult {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(kind, "kind");
        law = law == null ? "" : law;
        cautions = List.copyOf(cautions);
    }
}

package org.headway.friction;

import java.util.List;
import java.util.stream.Collectors;
import org.headway.caution.InputException;

/** The friction methods Headway offers, by id. */
public final class FrictionMethods {

    private static final List<FrictionCorrelation> ALL = List.of(
            new AutoFriction(),
            new HagenPoiseuille(),
            Colebrook1939.solver(),
            new SwameeJain1976(),
            new Haaland1983(),
            new Serghides1984(),
            new Churchill1977(),
            new GoudarSonnad2008(),
            new Blasius1913());

    private FrictionMethods() {}

    /** Every method, {@code auto} first. */
    public static List<FrictionCorrelation> all() {
        return ALL;
    }

    /** The ids of every method, in the order of {@link #all()}. */
    public static List<String> ids() {
        return ALL.stream().map(FrictionCorrelation::id).collect(Collectors.toUnmodifiableList());
    }

    /**
     * The method with an id.
     *
     * @param id method id, e.g. {@code colebrook}; case and surrounding blanks are ignored
     * @throws InputException naming "method" and listing the known ids if there is none
     */
    public static FrictionCorrelation byId(String id) {
        String key = id == null ? "" : id.strip().toLowerCase(java.util.Locale.ROOT);
        for (FrictionCorrelation correlation : ALL) {
            if (correlation.id().equals(key)) {
                return correlation;
            }
        }
        throw new InputException("method", "unknown friction method '" + id + "'; known: " + String.join(", ", ids()));
    }
}

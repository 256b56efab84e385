package org.headway.fitting;

import java.util.List;
import java.util.Map;

/**
 * Several forms fitted to the same data, best first.
 *
 * <p>Ranking is by the corrected Akaike criterion AICc (Hurvich, C. M. and Tsai, C.-L. (1989),
 * Regression and time series model selection in small samples, Biometrika 76(2), 297–307, from
 * memory), which trades residual sum of squares against the number of parameters; adjusted R² is
 * reported beside it. Both compare fits of the same response values only.
 *
 * @param ranked fits sorted by AICc, lowest (best) first
 * @param skipped forms that could not be fitted to these data, with the reason
 */
public record FitComparison(List<FitResult> ranked, Map<String, String> skipped) {
    public FitComparison {
        ranked = List.copyOf(ranked);
        skipped = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(skipped));
    }
}

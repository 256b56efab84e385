package org.headway.project;

import java.util.List;
import java.util.Optional;

/**
 * A project file as the engineer wrote it: quantities stay as the text they typed ({@code "35 m"},
 * {@code "12 L/s"}) so that saving gives back their units. {@link ProjectResolver} turns it into a
 * {@link org.headway.system.PipeRun}.
 *
 * @param title project title
 * @param titleBlock job reference and sign-off fields for the sheet
 * @param fluid the fluid
 * @param flow design flow, text with unit
 * @param flowUncertainty relative uncertainty of the flow, e.g. {@code "5 %"} or {@code "0.05"}
 * @param friction friction method id, or {@code fitted:PATH} for a saved fitted correlation
 * @param segments segments in flow order
 * @param ends end conditions
 * @param pump pump, if any
 * @param limits design limits (each optional)
 * @param sizing what sizing may choose from, if given
 * @param curve system curve range, if given
 */
public record Project(
        String title,
        TitleBlock titleBlock,
        FluidSpec fluid,
        String flow,
        String flowUncertainty,
        String friction,
        List<SegmentSpec> segments,
        EndsSpec ends,
        Optional<PumpSpec> pump,
        LimitsSpec limits,
        Optional<SizingSpec> sizing,
        Optional<CurveSpec> curve) {

    /** Format name written into every project file. */
    public static final String FORMAT = "headway-project";
    /** Current format version. */
    public static final int VERSION = 1;

    public Project {
        segments = List.copyOf(segments);
    }

    /** Sign-off block: all fields may be empty (the sheet then prints a blank line to sign). */
    public record TitleBlock(
            String job, String revision, String preparedBy, String checkedBy, String date, String notes) {
        public static final TitleBlock EMPTY = new TitleBlock("", "", "", "", "", "");
    }

    /**
     * @param name fluid id (e.g. {@code water}, {@code seawater:35}) or a user name with density and viscosity
     * @param temperature text with unit, required for catalog fluids
     * @param pressure absolute pressure text, optional (standard atmosphere if empty)
     * @param density override, text with unit, optional
     * @param viscosity dynamic viscosity override, text with unit, optional
     * @param vapourPressure override, text with unit, optional
     */
    public record FluidSpec(
            String name,
            String temperature,
            String pressure,
            String density,
            String viscosity,
            String vapourPressure) {}

    /**
     * @param name segment name
     * @param length text with unit
     * @param pipe catalog pipe, or empty when the bore is given
     * @param innerDiameter explicit bore or override, text with unit (optional with a catalog pipe)
     * @param roughness explicit roughness or override, text with unit (optional with a catalog pipe)
     * @param fittings fittings with counts
     * @param lossCoefficient explicit additional K, text (optional)
     * @param elevationChange outlet minus inlet elevation, text with unit (optional, 0)
     */
    public record SegmentSpec(
            String name,
            String length,
            Optional<PipeSpec> pipe,
            String innerDiameter,
            String roughness,
            List<FittingSpec> fittings,
            String lossCoefficient,
            String elevationChange) {
        public SegmentSpec {
            fittings = List.copyOf(fittings);
        }
    }

    /** A catalog pipe: material id, nominal size, schedule. */
    public record PipeSpec(String material, String size, String schedule) {}

    /**
     * @param kind fitting id in the catalog, or {@code fitted:PATH} for a saved K-vs-Re correlation
     * @param count how many
     * @param lossCoefficient explicit K override (optional)
     */
    public record FittingSpec(String kind, int count, String lossCoefficient) {}

    /** Source and delivery end. */
    public record EndsSpec(EndSpec source, EndSpec delivery) {
        public static final EndsSpec OPEN = new EndsSpec(EndSpec.OPEN, EndSpec.OPEN);
    }

    /** One end: surface level above the adjacent pipe end and gauge pressure, as text. */
    public record EndSpec(String level, String pressure) {
        public static final EndSpec OPEN = new EndSpec("", "");
    }

    /**
     * @param name pump name
     * @param position index of the first segment downstream of the pump
     * @param points maker's points
     * @param npshRequired NPSH required, optional
     */
    public record PumpSpec(String name, int position, List<PumpPointSpec> points, String npshRequired) {
        public PumpSpec {
            points = List.copyOf(points);
        }
    }

    /** A pump point as text. */
    public record PumpPointSpec(String flow, String head) {}

    /** Design limits as text, each optional. */
    public record LimitsSpec(
            String minimumVelocity,
            String maximumVelocity,
            String maximumFrictionLossPer100m,
            String headBudget,
            String npshMargin) {
        public static final LimitsSpec NONE = new LimitsSpec("", "", "", "", "");
    }

    /** Sizing candidates: a material and schedule from the catalog. */
    public record SizingSpec(String material, String schedule) {}

    /** System curve range as text. */
    public record CurveSpec(String minimumFlow, String maximumFlow, int points) {}
}

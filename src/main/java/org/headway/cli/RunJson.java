package org.headway.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import java.util.Locale;
import org.headway.caution.Caution;
import org.headway.system.ElementProfile;
import org.headway.system.OperatingPoint;
import org.headway.system.PipeRun;
import org.headway.system.RunResult;
import org.headway.system.SegmentResult;
import org.headway.system.SizeSelector;
import org.headway.system.SystemCurve;
import org.headway.system.UncertaintyBand;

/** Pipe-run results as JSON: SI values, unit-suffixed keys, round-trippable numbers. */
final class RunJson {

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private RunJson() {}

    /** The {@code cautions} array every JSON output carries: code, severity, message, basis. */
    static void putCautions(ObjectNode root, List<Caution> list) {
        ArrayNode cautions = root.putArray("cautions");
        for (Caution c : list) {
            ObjectNode n = cautions.addObject();
            n.put("code", c.code());
            n.put("severity", c.severity().name().toLowerCase(Locale.ROOT));
            n.put("message", c.message());
            n.put("basis", c.basis());
        }
    }

    static String toJson(
            PipeRun run,
            RunResult result,
            String mode,
            String modeNote,
            List<SystemCurve.Point> curve,
            OperatingPoint operating,
            UncertaintyBand band,
            List<SizeSelector.SizeCheck> sizes) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("title", run.title());
        root.put("mode", mode);
        if (!modeNote.isEmpty()) {
            root.put("mode_result", modeNote);
        }
        root.put("flow_m3_per_s", result.flow());
        ObjectNode fluid = root.putObject("fluid");
        fluid.put("name", run.fluid().fluid());
        fluid.put("temperature_k", run.fluid().temperature());
        if (!run.fluid().temperatureGiven()) {
            // the key stays (contract); this says its value is only the 20 °C the checks assume
            fluid.put("temperature_given", false);
        }
        fluid.put("density_kg_per_m3", run.fluid().density());
        fluid.put("dynamic_viscosity_pa_s", run.fluid().dynamicViscosity());
        run.fluid().vapourPressure().ifPresent(v -> fluid.put("vapour_pressure_pa", v));
        root.put("friction_method", run.friction().id());
        ArrayNode segs = root.putArray("segments");
        for (SegmentResult s : result.segments()) {
            ObjectNode n = segs.addObject();
            n.put("name", s.name());
            n.put("id", s.id());
            n.put("velocity_m_per_s", s.velocity());
            n.put("reynolds", s.reynolds());
            n.put("relative_roughness", s.relativeRoughness());
            n.put("regime", s.regime().name().toLowerCase(Locale.ROOT));
            n.put("friction_factor", s.frictionFactor());
            n.put("friction_method", s.frictionMethod());
            n.put("friction_iterations", s.frictionIterations());
            n.put("major_head_loss_m", s.majorHeadLoss());
            n.put("loss_coefficient_total", s.totalLossCoefficient());
            n.put("minor_head_loss_m", s.minorHeadLoss());
            n.put("inlet_elevation_m", s.inletElevation());
            n.put("outlet_elevation_m", s.outletElevation());
            n.put("outlet_energy_grade_m", s.outletEnergyGrade());
            n.put("outlet_hydraulic_grade_m", s.outletHydraulicGrade());
        }
        root.put("barometric_pressure_pa", run.atmosphericPressure());
        ArrayNode elements = root.putArray("elements");
        for (ElementProfile e : result.elements()) {
            ObjectNode n = elements.addObject();
            n.put("id", e.id());
            n.put("kind", e.kind());
            n.put("name", e.name());
            n.put("head_loss_m", e.result().headLoss());
            n.put("pressure_drop_pa", e.result().pressureDrop());
            n.put("law", e.result().law());
            n.put("inlet_elevation_m", e.inletElevation());
            n.put("outlet_elevation_m", e.outletElevation());
            n.put("inlet_hydraulic_grade_m", e.inletHydraulicGrade());
            n.put("outlet_hydraulic_grade_m", e.outletHydraulicGrade());
            n.put("inlet_pressure_pa", e.inletPressure());
            n.put("outlet_pressure_pa", e.outletPressure());
            n.put("inlet_absolute_pressure_pa", e.inletPressure() + run.atmosphericPressure());
            n.put("outlet_absolute_pressure_pa", e.outletPressure() + run.atmosphericPressure());
            e.highPointPressure().ifPresent(v -> n.put("high_point_pressure_pa", v));
        }
        ObjectNode totals = root.putObject("totals");
        totals.put("friction_head_loss_m", result.totals().frictionHeadLoss());
        totals.put("minor_head_loss_m", result.totals().minorHeadLoss());
        totals.put("static_head_m", result.totals().staticHead());
        totals.put("total_head_m", result.totals().totalHead());
        totals.put("pressure_drop_pa", result.totals().pressureDrop());
        totals.put("pump_pressure_rise_pa", result.totals().pumpPressureRise());
        result.npshAvailable().ifPresent(v -> totals.put("npsh_available_m", v));
        run.pumpElement()
                .flatMap(pe -> {
                    var v = pe.npshRequiredAt(result.flow());
                    return v.isPresent() ? java.util.Optional.of(v.getAsDouble()) : java.util.Optional.empty();
                })
                .ifPresent(v -> totals.put("npsh_required_m", v));
        if (operating != null) {
            ObjectNode op = root.putObject("operating_point");
            op.put("found", operating.found());
            if (operating.found()) {
                op.put("flow_m3_per_s", operating.flow());
                op.put("head_m", operating.head());
            }
            op.put("message", operating.message());
        }
        if (band != null) {
            ObjectNode b = root.putObject("uncertainty_band");
            b.put("flow_uncertainty", band.flowUncertainty());
            b.put("head_loss_nominal_m", band.headLoss().nominal());
            b.put("head_loss_low_m", band.headLoss().low());
            b.put("head_loss_high_m", band.headLoss().high());
            b.put("total_head_low_m", band.totalHead().low());
            b.put("total_head_high_m", band.totalHead().high());
        }
        if (!curve.isEmpty()) {
            ArrayNode c = root.putArray("system_curve");
            for (SystemCurve.Point p : curve) {
                ObjectNode n = c.addObject();
                n.put("flow_m3_per_s", p.flow());
                n.put("total_head_m", p.totalHead());
            }
        }
        if (!sizes.isEmpty()) {
            ArrayNode c = root.putArray("size_candidates");
            for (SizeSelector.SizeCheck check : sizes) {
                ObjectNode n = c.addObject();
                n.put("size", check.size().label());
                n.put("inner_diameter_m", check.size().innerDiameter());
                n.put("maximum_velocity_m_per_s", check.maximumVelocity());
                n.put("maximum_friction_loss_m_per_100m", check.maximumFrictionLossPer100m());
                n.put("total_head_m", check.totalHead());
                n.put("accepted", check.accepted());
                ArrayNode reasons = n.putArray("reasons");
                check.reasons().forEach(reasons::add);
            }
        }
        putCautions(root, result.cautions());
        try {
            return MAPPER.writeValueAsString(root);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }
}

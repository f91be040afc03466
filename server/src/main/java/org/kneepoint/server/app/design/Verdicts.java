package org.kneepoint.server.app.design;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.kneepoint.fitter.loadline.DesignCheckResult;
import org.kneepoint.fitter.loadline.DutyStepResult;
import org.kneepoint.fitter.loadline.IntrinsicCurve;
import org.kneepoint.fitter.select.DesignShortfalls;
import org.kneepoint.fitter.select.RankedGrade;
import org.kneepoint.fitter.select.Requirements;
import org.kneepoint.fitter.select.Shortfall;
import org.kneepoint.fitter.study.SweepPoint;
import org.kneepoint.server.app.wording.EngineeringUnits;

/**
 * The one place verdicts are made ({@link Verdict}): the rules are {@link DesignShortfalls}' (a permanent magnet, the
 * loss within the limit, B above zero, the point above the knee, the temperature inside the working range), the words
 * {@link ShortfallWording}'s. A duty sequence or a sweep gathers each kind of shortfall over its steps or temperatures
 * into one reason naming where it occurs; a selection meets its requirements when at least one grade does.
 */
public final class Verdicts {

    private static final String SHORT = "falls short: ";

    private Verdicts() {
    }

    /** A check against its loss limit at its temperature. */
    public static Verdict check(CheckRun run) {
        DesignCheckResult result = run.result();
        IntrinsicCurve curve = run.model().model().at(result.temperature());
        List<Shortfall> shortfalls = DesignShortfalls.of(result, curve, null);
        ShortfallWording wording = new ShortfallWording(result.temperature(), result.point().b(), result.irreversibleLoss(),
                run.lossLimit(), null, result.working().maximum().temperature(), result.working().minimum().temperature());
        List<String> reasons = shortfalls.stream().map(wording::words).toList();
        String pass = "meets the " + EngineeringUnits.percent(run.lossLimit()) + " limit: " + EngineeringUnits.percent(result.irreversibleLoss())
                + " loss at " + EngineeringUnits.celsius(result.temperature());
        return verdict(reasons, pass, lossAgainst(shortfalls, result.irreversibleLoss(), run.lossLimit(), ""));
    }

    /** A duty sequence against its loss limit: the loss so far, B and the knee at every step. */
    public static Verdict duty(DutyRun run) {
        Gathered gathered = new Gathered("step", "steps", run.results().size());
        int number = 0;
        for (DutyStepResult step : run.results()) {
            IntrinsicCurve curve = run.model().model().at(step.step().temperature());
            String label = ++number + " (" + EngineeringUnits.celsius(step.step().temperature()) + ")";
            if (number == 1) {
                DesignShortfalls.permanentMagnet(curve).ifPresent(shortfall -> gathered.add(shortfall, label, step.step().temperature()));
            }
            List<Shortfall> shortfalls = DesignShortfalls.atPoint(step.point().b(), DesignShortfalls.kneeMargin(curve, step.point().h()),
                    step.irreversibleLoss(), run.lossLimit());
            shortfalls.forEach(shortfall -> gathered.add(shortfall, label, step.step().temperature()));
        }
        double last = run.results().isEmpty() ? 0.0 : run.results().get(run.results().size() - 1).irreversibleLoss();
        String pass = "meets the " + EngineeringUnits.percent(run.lossLimit()) + " limit: " + EngineeringUnits.percent(last)
                + " loss after the last step";
        return gathered.verdict(run.lossLimit(), pass, "after the last step");
    }

    /** A sweep against its loss limit at every temperature of it. */
    public static Verdict sweep(SweepRun run) {
        List<SweepPoint> points = run.sweep().points();
        Gathered gathered = new Gathered("temperature", "temperatures", points.size());
        if (!points.isEmpty()) {
            DesignShortfalls.permanentMagnet(run.model().model().at(points.get(0).temperature()))
                    .ifPresent(shortfall -> gathered.add(shortfall, EngineeringUnits.celsius(points.get(0).temperature()),
                            points.get(0).temperature()));
        }
        for (SweepPoint point : points) {
            DesignShortfalls.atPoint(point.b(), point.kneeMarginH(), point.irreversibleLoss(), run.lossLimit())
                    .forEach(shortfall -> gathered.add(shortfall, EngineeringUnits.celsius(point.temperature()), point.temperature()));
        }
        double worst = points.stream().mapToDouble(SweepPoint::irreversibleLoss).max().orElse(0.0);
        String pass = "meets the " + EngineeringUnits.percent(run.lossLimit()) + " limit at every temperature swept: at most "
                + EngineeringUnits.percent(worst) + " loss";
        return gathered.verdict(run.lossLimit(), pass, "at the worst temperature");
    }

    /** One grade of a selection: its shortfalls, or why it could not be assessed. */
    public static Verdict row(SelectionRow row, Requirements requirements) {
        if (!row.assessable()) {
            return new Verdict(false, "not assessed: " + row.notAssessable(), List.of("not assessable: " + row.notAssessable()));
        }
        List<String> reasons = reasons(row, requirements);
        RankedGrade ranked = row.ranked();
        return verdict(reasons, "meets every requirement", lossAgainst(ranked.shortfalls(), ranked.irreversibleLoss(),
                requirements.maximumIrreversibleLoss(), ""));
    }

    /** Why a grade fails or cannot be assessed, one sentence each; empty when it passes. */
    public static List<String> reasons(SelectionRow row, Requirements requirements) {
        if (!row.assessable()) {
            return List.of("not assessable: " + row.notAssessable());
        }
        RankedGrade ranked = row.ranked();
        ShortfallWording wording = new ShortfallWording(requirements.temperature(), ranked.fluxDensity(), ranked.irreversibleLoss(),
                requirements.maximumIrreversibleLoss(), requirements.minimumFluxDensity(), ranked.maxWorkingTemperature(),
                ranked.minWorkingTemperature());
        return ranked.shortfalls().stream().map(wording::words).toList();
    }

    /** A whole selection: it meets the requirements when at least one grade does; otherwise each grade's reasons. */
    public static Verdict selection(SelectionRun run) {
        long passing = run.rows().stream().filter(SelectionRow::passes).count();
        int all = run.rows().size();
        if (passing > 0) {
            return new Verdict(true, "meets the requirements: " + passing + " of " + all + (all == 1 ? " grade meets" : " grades meet")
                    + " every requirement", List.of());
        }
        List<String> reasons = run.rows().stream()
                .map(row -> row.grade() + ": " + String.join("; ", reasons(row, run.requirements()))).toList();
        if (all == 0) {
            return new Verdict(false, SHORT + "no grades in the library to select from", List.of("no grades in the library to select from"));
        }
        return new Verdict(false, SHORT + (all == 1 ? "the one grade does not meet" : "none of the " + all + " grades meets")
                + " every requirement", reasons);
    }

    private static Verdict verdict(List<String> reasons, String pass, String loss) {
        if (reasons.isEmpty()) {
            return new Verdict(true, pass, reasons);
        }
        String first = loss != null ? loss : reasons.get(0);
        int more = reasons.size() - 1;
        return new Verdict(false, SHORT + first + (more == 0 ? "" : more == 1 ? " (and 1 more reason)" : " (and " + more
                + " more reasons)"), reasons);
    }

    /**
     * "41.9 % loss against 1 %" when the loss is among the shortfalls, else null; null too for a material that is not a
     * permanent magnet, whose summary says that first.
     */
    private static String lossAgainst(List<Shortfall> shortfalls, double loss, double limit, String where) {
        boolean over = shortfalls.stream().anyMatch(shortfall -> shortfall.requirement() == Shortfall.Requirement.MAXIMUM_IRREVERSIBLE_LOSS)
                && shortfalls.stream().noneMatch(shortfall -> shortfall.requirement() == Shortfall.Requirement.PERMANENT_MAGNET);
        return over ? EngineeringUnits.percent(loss) + " loss" + where + " against " + EngineeringUnits.percent(limit) : null;
    }

    /** Shortfalls of one kind gathered over the steps or temperatures they occur at, the worst kept. */
    private static final class Gathered {

        private final String one;
        private final String many;
        private final int total;
        private final Map<Shortfall.Requirement, List<String>> where = new EnumMap<>(Shortfall.Requirement.class);
        private final Map<Shortfall.Requirement, Double> worst = new EnumMap<>(Shortfall.Requirement.class);
        private final Map<Shortfall.Requirement, Double> worstAt = new EnumMap<>(Shortfall.Requirement.class);

        Gathered(String one, String many, int total) {
            this.one = one;
            this.many = many;
            this.total = total;
        }

        void add(Shortfall shortfall, String label, double temperature) {
            where.computeIfAbsent(shortfall.requirement(), key -> new ArrayList<>()).add(label);
            if (shortfall.by() >= worst.getOrDefault(shortfall.requirement(), -1.0)) {
                worst.put(shortfall.requirement(), shortfall.by());
                worstAt.put(shortfall.requirement(), temperature);
            }
        }

        Verdict verdict(double lossLimit, String pass, String worstLoss) {
            List<String> reasons = new ArrayList<>();
            String loss = null;
            for (Map.Entry<Shortfall.Requirement, List<String>> entry : where.entrySet()) {
                Shortfall.Requirement requirement = entry.getKey();
                double by = worst.get(requirement);
                String text = switch (requirement) {
                    case MAXIMUM_IRREVERSIBLE_LOSS -> "irreversible loss up to " + EngineeringUnits.percent(lossLimit + by)
                            + " exceeds the maximum " + EngineeringUnits.percent(lossLimit);
                    case POSITIVE_FLUX_DENSITY -> "operating point with B not above zero (down to " + EngineeringUnits.tesla(-by)
                            + "): the magnet works in the third quadrant";
                    case KNEE_MARGIN -> "margin to the knee is negative: the operating point lies up to " + EngineeringUnits.field(by)
                            + " below the knee (J = 0.9·Br)";
                    default -> new ShortfallWording(worstAt.get(requirement), Double.NaN, Double.NaN, lossLimit, null, null, null)
                            .words(new Shortfall(requirement, by));
                };
                if (requirement == Shortfall.Requirement.MAXIMUM_IRREVERSIBLE_LOSS && !where.containsKey(Shortfall.Requirement.PERMANENT_MAGNET)) {
                    loss = EngineeringUnits.percent(lossLimit + by) + " loss " + worstLoss + " against " + EngineeringUnits.percent(lossLimit);
                }
                reasons.add(requirement == Shortfall.Requirement.PERMANENT_MAGNET ? text : text + " " + places(entry.getValue()));
            }
            return Verdicts.verdict(reasons, pass, loss);
        }

        private String places(List<String> labels) {
            if (labels.size() == 1) {
                return "at " + one + " " + labels.get(0);
            }
            String list = labels.size() <= 4 ? String.join(", ", labels)
                    : labels.get(0) + " to " + labels.get(labels.size() - 1);
            return "at " + labels.size() + " of " + total + " " + many + " (" + list + ")";
        }
    }
}

package org.meridian.sim;

import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.meridian.core.Montage;
import org.meridian.core.TimeAxis;

/**
 * Everything a simulated study is made from, apart from the seed: its name, the electrodes
 * ({@link Montage}, directions on the unit sphere scaled to the head radius), the time axis,
 * the head model, the conditions with their trial counts, the sources, the number of
 * participants and the noise. Immutable; the {@code with…} methods give variants, which is how
 * a validation run builds many small studies from one scenario.
 */
public record Scenario(String name, Montage montage, TimeAxis axis, SphereHeadModel head,
        List<ConditionSpec> conditions, List<Source> sources, int participants, NoiseModel noise) {

    public Scenario {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a scenario needs a name");
        }
        if (montage.size() < 2) {
            throw new IllegalArgumentException("a scenario needs at least two electrodes "
                    + "(the data are average-referenced)");
        }
        conditions = List.copyOf(conditions);
        sources = List.copyOf(sources);
        if (conditions.isEmpty()) {
            throw new IllegalArgumentException("a scenario needs at least one condition");
        }
        if (participants < 1) {
            throw new IllegalArgumentException("a scenario needs at least one participant, got "
                    + participants);
        }
        Set<String> conditionNames = new HashSet<>();
        for (ConditionSpec c : conditions) {
            if (!conditionNames.add(c.name().toLowerCase(Locale.ROOT))) {
                throw new IllegalArgumentException("condition " + c.name() + " is listed twice");
            }
        }
        Set<String> sourceNames = new HashSet<>();
        for (Source s : sources) {
            if (!sourceNames.add(s.name().toLowerCase(Locale.ROOT))) {
                throw new IllegalArgumentException("source " + s.name() + " is listed twice");
            }
            for (String c : s.gains().keySet()) {
                if (conditions.stream().noneMatch(spec -> spec.name().equals(c))) {
                    throw new IllegalArgumentException("source " + s.name()
                            + " has a gain for condition " + c + ", which the scenario lacks");
                }
            }
            if (!head.accepts(s.positionM())) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                        "source %s lies at %.1f %% of the radius; the sphere model takes sources "
                                + "within %.0f %%", s.name(), 100 * head.eccentricity(s.positionM()),
                        100 * SphereHeadModel.MAX_ECCENTRICITY));
            }
        }
    }

    public Scenario withParticipants(int n) {
        return new Scenario(name, montage, axis, head, conditions, sources, n, noise);
    }

    public Scenario withNoise(NoiseModel newNoise) {
        return new Scenario(name, montage, axis, head, conditions, sources, participants, newNoise);
    }

    public Scenario withSources(List<Source> newSources) {
        return new Scenario(name, montage, axis, head, conditions, newSources, participants, noise);
    }

    public Scenario withConditions(List<ConditionSpec> newConditions) {
        return new Scenario(name, montage, axis, head, newConditions, sources, participants, noise);
    }

    public Scenario withMontage(Montage newMontage) {
        return new Scenario(name, newMontage, axis, head, conditions, sources, participants, noise);
    }

    public Scenario withName(String newName) {
        return new Scenario(newName, montage, axis, head, conditions, sources, participants, noise);
    }

    /** The names of the conditions, in order. */
    public List<String> conditionNames() {
        return conditions.stream().map(ConditionSpec::name).toList();
    }
}

package org.meridian.core;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.OptionalInt;

/**
 * Averaged waveforms of a study: participants × conditions, each cell one {@link Waveforms}
 * with the same channels, time axis and unit, an optional trial count per cell, the
 * {@link Montage} of the positioned channels and a note of how every channel label found its
 * position. Conditions here are the loaded ones; derived conditions (contrasts) are computed
 * from them by the signal package. Immutable; build one with {@link #builder}.
 */
public final class Study {
    private final String name;
    private final List<String> participants;
    private final List<String> conditions;
    private final Waveforms[][] cells;
    private final int[][] trials;
    private final Montage montage;
    private final List<ChannelPlacement> placements;
    private final List<InputFile> inputFiles;

    private Study(Builder b) {
        this.name = b.name;
        this.participants = List.copyOf(b.participants);
        this.conditions = List.copyOf(b.conditions);
        if (participants.isEmpty() || conditions.isEmpty()) {
            throw new BadInputException(name + ": the study has no waveforms");
        }
        this.cells = new Waveforms[participants.size()][conditions.size()];
        this.trials = new int[participants.size()][conditions.size()];
        Waveforms first = null;
        String firstName = null;
        for (int p = 0; p < participants.size(); p++) {
            for (int c = 0; c < conditions.size(); c++) {
                String cell = participants.get(p) + "/" + conditions.get(c);
                Entry e = b.entries.get(key(participants.get(p), conditions.get(c)));
                if (e == null) {
                    throw new BadInputException(name + ": no waveforms for participant "
                            + participants.get(p) + ", condition " + conditions.get(c));
                }
                Waveforms w = e.waveforms;
                if (first == null) {
                    first = w;
                    firstName = cell;
                } else {
                    String diff = first.describeLayoutDifference(w);
                    if (diff != null) {
                        throw new BadInputException(name + ": " + firstName + " and " + cell
                                + " have " + diff);
                    }
                }
                cells[p][c] = w;
                trials[p][c] = e.trials;
            }
        }
        this.montage = b.montage == null ? new Montage(List.of(), "none") : b.montage;
        this.placements = b.placements == null ? List.of() : List.copyOf(b.placements);
        this.inputFiles = List.copyOf(b.inputFiles);
    }

    public static Builder builder(String name) {
        return new Builder(name);
    }

    /** Where the study came from (a manifest path, a folder, a file), for messages. */
    public String name() {
        return name;
    }

    public List<String> participants() {
        return participants;
    }

    public List<String> conditions() {
        return conditions;
    }

    public int participantIndex(String participant) {
        return indexIgnoringCase(participants, participant);
    }

    public int conditionIndex(String condition) {
        return indexIgnoringCase(conditions, condition);
    }

    public Waveforms waveforms(int participant, int condition) {
        return cells[participant][condition];
    }

    public Waveforms waveforms(String participant, String condition) {
        int p = participantIndex(participant);
        int c = conditionIndex(condition);
        if (p < 0) {
            throw new BadInputException(name + ": no participant " + participant);
        }
        if (c < 0) {
            throw new BadInputException(name + ": no condition " + condition);
        }
        return cells[p][c];
    }

    /** The trial count behind one average, when the manifest gave it. */
    public OptionalInt trials(int participant, int condition) {
        int t = trials[participant][condition];
        return t < 0 ? OptionalInt.empty() : OptionalInt.of(t);
    }

    /** Every cell shares these labels, in this order. */
    public List<String> channelLabels() {
        return cells[0][0].labels();
    }

    public TimeAxis axis() {
        return cells[0][0].axis();
    }

    public Unit unit() {
        return cells[0][0].unit();
    }

    /** The positioned channels (a subset of the channel labels). */
    public Montage montage() {
        return montage;
    }

    /** How each channel label found its position, in channel order. */
    public List<ChannelPlacement> placements() {
        return placements;
    }

    /**
     * The files this study was read from (manifest, waveform files or long table, montage
     * file), or those of the study it was derived from; empty for a study built in memory.
     * Commands check their outputs against these, so no input is ever written over.
     */
    public List<InputFile> inputFiles() {
        return inputFiles;
    }

    /** The channels without a position, in channel order. */
    public List<String> unpositionedChannels() {
        List<String> out = new ArrayList<>();
        for (String l : channelLabels()) {
            if (!montage.contains(l)) {
                out.add(l);
            }
        }
        return Collections.unmodifiableList(out);
    }

    /**
     * A study with the same participants, conditions and trial counts whose waveforms are
     * replaced cell by cell (e.g. by their CSD or after a channel repair).
     */
    public Study mapWaveforms(String newName, java.util.function.BiFunction<Integer, Integer, Waveforms> f) {
        Builder b = builder(newName).montage(montage).placements(placements).inputFiles(inputFiles);
        for (int p = 0; p < participants.size(); p++) {
            for (int c = 0; c < conditions.size(); c++) {
                b.add(participants.get(p), conditions.get(c), f.apply(p, c), trials[p][c]);
            }
        }
        return b.build();
    }

    private static int indexIgnoringCase(List<String> names, String wanted) {
        for (int i = 0; i < names.size(); i++) {
            if (names.get(i).equalsIgnoreCase(wanted)) {
                return i;
            }
        }
        return -1;
    }

    private static String key(String participant, String condition) {
        return participant + "\u0000" + condition;
    }

    private record Entry(Waveforms waveforms, int trials) {
    }

    /** Collects cells in any order; participants and conditions keep their first-seen order. */
    public static final class Builder {
        private final String name;
        private final List<String> participants = new ArrayList<>();
        private final List<String> conditions = new ArrayList<>();
        private final Map<String, Entry> entries = new LinkedHashMap<>();
        private Montage montage;
        private List<ChannelPlacement> placements;
        private List<InputFile> inputFiles = List.of();

        private Builder(String name) {
            this.name = Objects.requireNonNull(name);
        }

        /** Adds one cell; {@code trials} is the trial count, or -1 when unknown. */
        public Builder add(String participant, String condition, Waveforms waveforms, int trials) {
            if (indexIgnoringCase(participants, participant) < 0) {
                participants.add(participant);
            }
            if (indexIgnoringCase(conditions, condition) < 0) {
                conditions.add(condition);
            }
            String p = participants.get(indexIgnoringCase(participants, participant));
            String c = conditions.get(indexIgnoringCase(conditions, condition));
            if (entries.put(key(p, c), new Entry(waveforms, trials)) != null) {
                throw new BadInputException(name + ": participant " + participant + ", condition "
                        + condition + " is given twice");
            }
            return this;
        }

        public Builder add(String participant, String condition, Waveforms waveforms) {
            return add(participant, condition, waveforms, -1);
        }

        public Builder montage(Montage m) {
            this.montage = m;
            return this;
        }

        public Builder placements(List<ChannelPlacement> p) {
            this.placements = p;
            return this;
        }

        /** The files the study is read from (see {@link Study#inputFiles()}). */
        public Builder inputFiles(List<InputFile> files) {
            this.inputFiles = List.copyOf(files);
            return this;
        }

        public Study build() {
            return new Study(this);
        }
    }
}

package org.meridian.figure.spec;

import com.fasterxml.jackson.annotation.JsonProperty;

/**
 * Which interval band surrounds each wave (DESIGN §6.2):
 * <ul>
 *   <li>{@code none};</li>
 *   <li>{@code across-participants}: the t-interval of each wave's grand average;</li>
 *   <li>{@code within-participants} (default): loaded conditions shown together in a panel get the
 *       Cousineau (2005) – Morey (2008) within-participant interval, which is what a reader
 *       comparing them needs; a contrast, or a condition shown alone, gets the t-interval across
 *       participants — for a difference wave that interval already is the within-participant
 *       one.</li>
 * </ul>
 */
public enum IntervalKind {
    @JsonProperty("none") NONE,
    @JsonProperty("across-participants") ACROSS_PARTICIPANTS,
    @JsonProperty("within-participants") WITHIN_PARTICIPANTS
}

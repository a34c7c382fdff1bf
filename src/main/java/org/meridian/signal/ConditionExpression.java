package org.meridian.signal;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.function.Function;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.core.Waveforms;

/**
 * A condition or a contrast of conditions: a linear combination Σ c_k · condition_k, computed for
 * each participant and then averaged (DESIGN §6.1). A difference wave is the commonest case.
 *
 * <p><b>Syntax.</b> Condition names, numbers, {@code + - * /} and parentheses, e.g.
 * {@code rare - common}, {@code 0.5*a + 0.5*b - c}, {@code (left + right)/2 - neutral},
 * {@code 'go left' - 'go right'}. A name that is not a plain word (letters, digits, {@code _},
 * {@code .}, not starting with a digit) goes in single quotes; a quote inside a quoted name is
 * doubled ({@code 'it''s'}). Names match the study's conditions ignoring case. The result must
 * be linear: numbers may multiply or divide a condition, but two conditions may not be
 * multiplied, and a number may not be added to a wave. Repeated names are combined
 * ({@code a + a} is {@code 2*a}); terms that cancel are dropped.
 *
 * <p>Errors are {@link ExpressionSyntaxException}s carrying the character position, a reason and,
 * for an unknown name, the nearest condition name.
 *
 * <p><b>Trial weights.</b> In a trial-weighted grand average a participant counts by
 * 1 / Σ_k (c_k² / n_k), n_k its trial count in condition k: the inverse of the noise variance of
 * the combination when every trial carries the same noise. For a single condition this is its
 * trial count n.
 *
 * <p>Immutable; two expressions are equal when they have the same terms.
 */
public final class ConditionExpression implements ConditionWave {

    /** One condition with its coefficient. */
    public record Term(double coefficient, String condition) {
        public Term {
            Objects.requireNonNull(condition);
            if (!Double.isFinite(coefficient) || coefficient == 0) {
                throw new IllegalArgumentException("a term needs a finite non-zero coefficient, got "
                        + coefficient + " for " + condition);
            }
        }
    }

    private final String name;
    private final List<Term> terms;

    private ConditionExpression(String name, List<Term> terms) {
        if (terms.isEmpty()) {
            throw new IllegalArgumentException("an expression needs at least one term");
        }
        this.terms = List.copyOf(terms);
        this.name = name == null ? canonical(this.terms) : name;
    }

    /**
     * Reads an expression over the given condition names.
     *
     * @param text           the expression, e.g. {@code rare - common}
     * @param conditionNames the conditions it may name (matched ignoring case)
     * @throws ExpressionSyntaxException with the position and reason when it cannot be read
     */
    public static ConditionExpression parse(String text, List<String> conditionNames) {
        Objects.requireNonNull(text);
        // a whole expression that is exactly one condition's name is that condition, even when
        // the name holds an operator (a file named "dip-10-20" gives a condition of that name)
        for (String name : conditionNames) {
            if (name.equalsIgnoreCase(text.strip()) && !name.isEmpty()) {
                return condition(name);
            }
        }
        Map<String, Double> coefficients = ExpressionParser.parse(text, conditionNames);
        List<Term> terms = new ArrayList<>();
        coefficients.forEach((c, v) -> terms.add(new Term(v, c)));
        return new ConditionExpression(text.strip(), terms);
    }

    /** Reads an expression over the conditions of a study. */
    public static ConditionExpression parse(String text, Study study) {
        return parse(text, study.conditions());
    }

    /**
     * Reads a comma-separated list of expressions, e.g. {@code rare, common, rare - common};
     * commas inside single quotes or parentheses do not split.
     *
     * @throws ExpressionSyntaxException for the first expression that cannot be read
     */
    public static List<ConditionExpression> parseList(String text, List<String> conditionNames) {
        List<ConditionExpression> out = new ArrayList<>();
        for (String part : splitList(text)) {
            out.add(parse(part, conditionNames));
        }
        return out;
    }

    /** Splits at commas outside single quotes and parentheses; parts are trimmed. */
    public static List<String> splitList(String text) {
        List<String> parts = new ArrayList<>();
        boolean quoted = false;
        int depth = 0;
        int start = 0;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\'') {
                quoted = !quoted;
            } else if (!quoted && c == '(') {
                depth++;
            } else if (!quoted && c == ')') {
                depth = Math.max(0, depth - 1);
            } else if (!quoted && depth == 0 && c == ',') {
                parts.add(text.substring(start, i).strip());
                start = i + 1;
            }
        }
        parts.add(text.substring(start).strip());
        return parts;
    }

    /** One loaded condition on its own. */
    public static ConditionExpression condition(String name) {
        return new ConditionExpression(null, List.of(new Term(1, name)));
    }

    /** A combination given term by term; its name is the canonical text. */
    public static ConditionExpression of(List<Term> terms) {
        return new ConditionExpression(null, terms);
    }

    /** The name: the text as written (trimmed) when parsed, else the canonical text. */
    @Override
    public String name() {
        return name;
    }

    public List<Term> terms() {
        return terms;
    }

    /** Whether this is one condition with coefficient 1. */
    public boolean isSingleCondition() {
        return terms.size() == 1 && terms.get(0).coefficient() == 1;
    }

    /** Σ c_k · waves(condition_k), computed in double precision, stored as floats. */
    public Waveforms evaluate(Function<String, Waveforms> waves) {
        Waveforms first = waves.apply(terms.get(0).condition());
        if (isSingleCondition()) {
            return first;
        }
        double[] sum = new double[first.channelCount() * first.sampleCount()];
        int n = first.sampleCount();
        for (Term t : terms) {
            Waveforms w = waves.apply(t.condition());
            String diff = first.describeLayoutDifference(w);
            if (diff != null) {
                throw new BadInputException("cannot combine " + terms.get(0).condition() + " and "
                        + t.condition() + ": they have " + diff);
            }
            double c = t.coefficient();
            for (int ch = 0; ch < w.channelCount(); ch++) {
                int off = ch * n;
                for (int s = 0; s < n; s++) {
                    sum[off + s] += c * w.value(ch, s);
                }
            }
        }
        float[] out = new float[sum.length];
        for (int i = 0; i < sum.length; i++) {
            out[i] = (float) sum[i];
        }
        return Waveforms.wrap(first.labels(), first.axis(), first.unit(), out);
    }

    @Override
    public Waveforms forParticipant(Study study, int participant) {
        return evaluate(c -> study.waveforms(study.participants().get(participant), c));
    }

    @Override
    public double trialWeight(Study study, int participant) {
        double variance = 0;
        for (Term t : terms) {
            int condition = study.conditionIndex(t.condition());
            if (condition < 0) {
                throw new BadInputException(study.name() + ": no condition " + t.condition());
            }
            var trials = study.trials(participant, condition);
            if (trials.isEmpty()) {
                return -1;
            }
            if (trials.getAsInt() == 0) {
                return 0;
            }
            variance += t.coefficient() * t.coefficient() / trials.getAsInt();
        }
        return 1 / variance;
    }

    /** The canonical text, e.g. {@code 0.5*a + 0.5*b - c} or {@code 'go left' - 'go right'}. */
    public String canonicalText() {
        return canonical(terms);
    }

    /** A condition name as it must be written in an expression: quoted unless a plain word. */
    public static String quoteIfNeeded(String condition) {
        boolean plain = !condition.isEmpty() && ExpressionParser.isNameStart(condition.charAt(0));
        for (int i = 0; plain && i < condition.length(); i++) {
            plain = ExpressionParser.isNamePart(condition.charAt(i));
        }
        return plain ? condition : "'" + condition.replace("'", "''") + "'";
    }

    private static String canonical(List<Term> terms) {
        StringBuilder sb = new StringBuilder();
        for (Term t : terms) {
            double c = t.coefficient();
            if (sb.length() == 0) {
                sb.append(c < 0 ? "-" : "");
            } else {
                sb.append(c < 0 ? " - " : " + ");
            }
            double a = Math.abs(c);
            if (a != 1) {
                sb.append(new BigDecimal(a).round(new MathContext(6)).stripTrailingZeros()
                        .toPlainString()).append('*');
            }
            sb.append(quoteIfNeeded(t.condition()));
        }
        return sb.toString();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ConditionExpression e && e.terms.equals(terms);
    }

    @Override
    public int hashCode() {
        return terms.hashCode();
    }

    @Override
    public String toString() {
        return name;
    }
}

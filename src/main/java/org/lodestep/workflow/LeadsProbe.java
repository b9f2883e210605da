package org.lodestep.workflow;

import java.io.IOException;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

import org.lodestep.wiring.Identification;
import org.lodestep.wiring.LeadPair;
import org.lodestep.wiring.ProbeSession;

/**
 * Use case: guided measurement. Asks for one lead pair at a time, in the order that settles the layout with the
 * fewest readings, and stops as soon as the answer is certain or the person measuring stops. How a question is put
 * and an answer read (a prompt, a form, a meter on a serial line) is the {@link Meter}'s business.
 */
public final class LeadsProbe {
    private LeadsProbe() {
    }

    /**
     * @param leads the lead labels, in the order the person measuring knows them
     * @param leadsSettings how to judge the readings
     */
    public record Settings(List<String> leads, LeadsSettings leadsSettings) {
        public Settings {
            leads = List.copyOf(leads);
            Objects.requireNonNull(leadsSettings, "leadsSettings");
            if (leads.size() < 2 || leads.stream().distinct().count() != leads.size()
                    || leads.stream().anyMatch(String::isBlank)) {
                throw new SettingsException("expected at least two distinct, non-blank lead labels: " + leads);
            }
            for (String l : leads) {
                if (l.length() > org.lodestep.sample.InputLimits.MAX_LABEL_CHARS) {
                    throw new SettingsException("a lead label is " + l.length() + " characters long: expected at most "
                            + org.lodestep.sample.InputLimits.MAX_LABEL_CHARS);
                }
            }
        }

        /** Every pair the leads make, N(N−1)/2. */
        public int allPairs() {
            return leads.size() * (leads.size() - 1) / 2;
        }
    }

    /**
     * The next reading wanted.
     *
     * @param number the reading's number, from 1
     * @param first  the pair's lead that comes first in the given label order
     * @param second the other lead
     */
    public record Question(int number, String first, String second) {
        public LeadPair pair() {
            return LeadPair.of(first, second);
        }
    }

    /** An answer to a {@link Question}. */
    public sealed interface Answer {
        /** The asked pair read {@code ohms}; empty for open circuit. */
        record Reading(OptionalDouble ohms) implements Answer {
        }

        /** A reading of another pair than the one asked; empty {@code ohms} for open circuit. */
        record OtherPair(String leadA, String leadB, OptionalDouble ohms) implements Answer {
        }

        /** Withdraw the last reading. */
        record Undo() implements Answer {
        }

        /** Stop before the answer is certain. */
        record Stop(StopReason reason) implements Answer {
        }
    }

    /** Why a session stopped before the answer was certain. */
    public enum StopReason {
        /** The person measuring asked to stop. */
        QUIT,
        /** The answers ran out (end of a file or of piped input). */
        END_OF_ANSWERS
    }

    /** Puts the questions and reads the answers. */
    public interface Meter {
        /** The answer to {@code question}. */
        Answer ask(Question question) throws IOException;

        /** An undo was asked for; {@code withdrew} is false when there was nothing to withdraw. */
        default void undone(boolean withdrew) {
        }

        /** A reading could not be recorded (a lead that is not one of the labels): the reason. */
        default void refused(String reason) {
        }

        /**
         * Whether this meter shows the identification as it fills in; when true, {@link #soFar} hears it after
         * each reading or undo (a prompt that only asks need not pay for it).
         */
        default boolean followsIdentification() {
            return false;
        }

        /** The identification from the readings so far: windings, connections and findings as they settle. */
        default void soFar(Identification identification) {
        }
    }

    /**
     * @param identification the result from the readings taken
     * @param readings       readings taken (withdrawn ones not counted)
     * @param allPairs       every pair the leads make
     * @param stopped        why it stopped early, or null when it ran until the answer was certain (or nothing
     *                       more could be learnt)
     */
    public record Result(Identification identification, int readings, int allPairs, StopReason stopped) {
        public Result {
            Objects.requireNonNull(identification, "identification");
        }
    }

    /** Runs a session until the answer is certain or the meter stops it. */
    public static Result run(Settings settings, Meter meter, Progress progress) throws IOException {
        List<String> leads = settings.leads();
        ProbeSession session = new ProbeSession(leads, settings.leadsSettings().identifySettings(OptionalDouble.empty()));
        StopReason stopped = null;
        while (stopped == null && !session.determined()) {
            Optional<LeadPair> next = session.nextPair();
            if (next.isEmpty()) {
                break;
            }
            LeadPair p = next.get();
            // In the given label order (red-blue as listed), not the pair's canonical order.
            boolean inOrder = leads.indexOf(p.a()) < leads.indexOf(p.b());
            Question q = new Question(session.readingCount() + 1, inOrder ? p.a() : p.b(), inOrder ? p.b() : p.a());
            progress.step("measuring " + q.first() + "-" + q.second());
            Answer a = meter.ask(q);
            if (a instanceof Answer.Stop s) {
                stopped = s.reason();
            } else if (a instanceof Answer.Undo) {
                meter.undone(session.undo());
            } else if (a instanceof Answer.Reading r) {
                session.record(p, finite(r.ohms()));
            } else if (a instanceof Answer.OtherPair o) {
                try {
                    session.record(LeadPair.of(o.leadA(), o.leadB()), finite(o.ohms()));
                } catch (IllegalArgumentException e) {
                    meter.refused(e.getMessage());
                }
            }
            if (stopped == null && meter.followsIdentification()) {
                meter.soFar(session.result());
            }
            progress.advanced(session.readingCount(), settings.allPairs());
        }
        return new Result(session.result(), session.readingCount(), settings.allPairs(), stopped);
    }

    /** An infinite reading is an open circuit. */
    private static OptionalDouble finite(OptionalDouble ohms) {
        return ohms.isPresent() && Double.isInfinite(ohms.getAsDouble()) ? OptionalDouble.empty() : ohms;
    }
}

package org.thermion.verify;

/** What the check made of one seeded fault. */
public record MutantOutcome(String fault, Status status, String evidence) {

    /** How a mutant fared. */
    public enum Status {
        /** A case (or the decode-line check) showed the fault. */
        CAUGHT("caught"),
        /** Exhaustive check found no difference, and the faulty net feeds no state bit, PC or decode line. */
        UNUSED("equivalent: feeds no state, pc or decode line"),
        /** Exhaustive check found no difference: the fault does not change ISA behaviour. */
        EQUIVALENT("equivalent: no case differs"),
        /** A sampled check found no difference: it may change ISA behaviour unseen. */
        NOT_CAUGHT("NOT CAUGHT (sampled check)");

        private final String text;

        Status(String text) {
            this.text = text;
        }

        public String text() {
            return text;
        }
    }
}

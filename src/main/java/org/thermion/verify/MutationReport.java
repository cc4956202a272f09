package org.thermion.verify;

import java.util.List;

/** Outcome of fault seeding: one entry per mutant. */
public record MutationReport(long seed, List<MutantOutcome> outcomes) {

    private long count(MutantOutcome.Status s) {
        return outcomes.stream().filter(o -> o.status() == s).count();
    }

    public long caught() {
        return count(MutantOutcome.Status.CAUGHT);
    }

    public long equivalent() {
        return count(MutantOutcome.Status.EQUIVALENT) + count(MutantOutcome.Status.UNUSED);
    }

    public long missed() {
        return count(MutantOutcome.Status.NOT_CAUGHT);
    }

    /** True when no mutant that may change ISA behaviour went uncaught. */
    public boolean allIsaChangingCaught() {
        return missed() == 0;
    }
}

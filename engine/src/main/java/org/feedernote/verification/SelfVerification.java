package org.feedernote.verification;

import java.util.List;

import org.feedernote.Version;
import org.feedernote.data.ReferenceData;
import org.feedernote.verification.PublishedCase.Outcome;

/** Every published case run against the program as built: what {@code feedernote selfcheck} reports. */
public record SelfVerification(String engineVersion, String dataVersion, List<Outcome> outcomes) {

    public SelfVerification {
        outcomes = List.copyOf(outcomes);
    }

    public static SelfVerification run(ReferenceData data) {
        return run(data, PublishedCases.all());
    }

    public static SelfVerification run(ReferenceData data, List<PublishedCase> cases) {
        return new SelfVerification(Version.engine(), data.version(), cases.stream().map(c -> c.check(data)).toList());
    }

    public long passed() {
        return outcomes.stream().filter(Outcome::pass).count();
    }

    public boolean allPass() {
        return passed() == outcomes.size();
    }
}

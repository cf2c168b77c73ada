package org.shutline.report;

import java.time.LocalDateTime;
import java.util.Objects;

/**
 * What a map's title block says: the project, the phase (may be empty), the subject
 * (the step or the incident, e.g. "Step 2: abandon M-CI-01"), the date and time the
 * map was made, who prepared it (may be empty), and the network file with its
 * last-modified time (may be null when unknown).
 */
public record TitleInfo(String project, String phase, String subject, LocalDateTime made, String preparedBy,
                        String networkFile, LocalDateTime networkDate) {
    public TitleInfo {
        Objects.requireNonNull(project, "project");
        Objects.requireNonNull(subject, "subject");
        Objects.requireNonNull(made, "made");
        phase = phase == null ? "" : phase;
        preparedBy = preparedBy == null ? "" : preparedBy;
        networkFile = networkFile == null ? "" : networkFile;
    }

    public TitleInfo withSubject(String s) {
        return new TitleInfo(project, phase, s, made, preparedBy, networkFile, networkDate);
    }
}

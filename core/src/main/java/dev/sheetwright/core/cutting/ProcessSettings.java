package dev.sheetwright.core.cutting;

import java.util.Objects;

/**
 * Per-process machine figures that do not depend on material: rapid traverse speed and the manual sheet load/unload
 * time, each with its source.
 */
public record ProcessSettings(CuttingProcess process, double rapidMmPerMin, String rapidSource,
                              double loadMinutesPerSheet, String loadSource) {

    public ProcessSettings {
        Objects.requireNonNull(process, "process");
        if (!(rapidMmPerMin > 0) || !Double.isFinite(rapidMmPerMin)) {
            throw new IllegalArgumentException("rapidMmPerMin must be finite and > 0, was " + rapidMmPerMin);
        }
        if (!(loadMinutesPerSheet >= 0) || !Double.isFinite(loadMinutesPerSheet)) {
            throw new IllegalArgumentException("loadMinutesPerSheet must be finite and >= 0, was "
                    + loadMinutesPerSheet);
        }
        if (rapidSource == null || rapidSource.isBlank()) {
            throw new IllegalArgumentException("rapidSource must not be blank");
        }
        if (loadSource == null || loadSource.isBlank()) {
            throw new IllegalArgumentException("loadSource must not be blank");
        }
    }

    public ProcessSettings withRapid(double mmPerMin, String source) {
        return new ProcessSettings(process, mmPerMin, source, loadMinutesPerSheet, loadSource);
    }

    public ProcessSettings withLoadMinutes(double minutes, String source) {
        return new ProcessSettings(process, rapidMmPerMin, rapidSource, minutes, source);
    }
}

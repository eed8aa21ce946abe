package dev.sheetwright.cli;

import picocli.CommandLine.IVersionProvider;

/** Reads the version from the jar manifest. */
public final class ManifestVersion implements IVersionProvider {

    @Override
    public String[] getVersion() {
        String v = SheetwrightCommand.class.getPackage().getImplementationVersion();
        return new String[] {"sheetwright " + (v == null ? "(development build)" : v)};
    }
}

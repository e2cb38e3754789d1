package org.arcwright.cli;

import picocli.CommandLine.IVersionProvider;

/** Reports the version from the jar manifest, or "development" when running from classes. */
public final class VersionProvider implements IVersionProvider {
    @Override
    public String[] getVersion() {
        String v = ArcwrightCommand.class.getPackage().getImplementationVersion();
        return new String[] {"Arcwright " + (v == null ? "development build" : v)};
    }
}

package org.arcwright.cli;

import picocli.CommandLine.IVersionProvider;

/** Reports the version from the jar manifest, or "development" when running from classes. */
public final class VersionProvider implements IVersionProvider {
    @Override
    public String[] getVersion() {
        return new String[] {org.arcwright.services.SheetService.generatedBy()};
    }
}

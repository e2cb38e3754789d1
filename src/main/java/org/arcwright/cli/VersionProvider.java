package org.arcwright.cli;

import org.arcwright.services.SheetService;
import picocli.CommandLine.IVersionProvider;

/** Reports the version from the jar manifest, or "development" when running from classes. */
public final class VersionProvider implements IVersionProvider {
    @Override
    public String[] getVersion() {
        return new String[] {SheetService.generatedBy()};
    }
}

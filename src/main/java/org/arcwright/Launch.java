package org.arcwright;

import java.awt.GraphicsEnvironment;
import org.arcwright.app.DesktopApp;
import org.arcwright.cli.Cli;

/**
 * Entry point of the jar: the desktop window when started with no arguments on a display, the
 * command line otherwise.
 */
public final class Launch {
    private Launch() {}

    public static void main(String[] args) {
        if (args.length == 0) {
            if (!GraphicsEnvironment.isHeadless()) {
                DesktopApp.launch(args);
                return;
            }
            Cli.run(new String[] {"--help"});
            System.out.println();
            System.out.println("No display found, so the window cannot open. Run ./arcwright on a desktop session,");
            System.out.println("or under a virtual display: xvfb-run -a ./arcwright");
            return;
        }
        System.exit(Cli.run(args));
    }
}

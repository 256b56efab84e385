package org.headway;

import java.util.Arrays;
import org.headway.app.DesktopLauncher;
import org.headway.cli.HeadwayCommand;

/**
 * Entry point of {@code headway.jar}. Not a JavaFX {@code Application}, so that the fat jar starts
 * without the JavaFX module path. With no arguments, or {@code gui [project.json]}, it opens the
 * desktop window when a display is present and prints the command-line help when there is none;
 * anything else goes to the command line. The command line never depends on the desktop app.
 */
public final class Launcher {

    private Launcher() {}

    public static void main(String[] args) {
        boolean gui = args.length == 0 || args[0].equals("gui");
        if (!gui) {
            System.exit(HeadwayCommand.run(args));
            return;
        }
        if (DesktopLauncher.displayAvailable()) {
            try {
                DesktopLauncher.launch(args.length == 0 ? args : Arrays.copyOfRange(args, 1, args.length));
                System.exit(0);
                return;
            } catch (RuntimeException | LinkageError e) {
                // A display without the libraries JavaFX needs (e.g. no GTK): fall back to the command line.
                System.err.println("headway: the desktop window could not open (" + e + "); the command line offers:");
                HeadwayCommand.run("--help");
                System.exit(1);
                return;
            }
        }
        if (args.length > 0) {
            System.err.println("headway: no display found for the desktop window; the command line offers:");
        }
        int code = HeadwayCommand.run("--help");
        System.exit(args.length == 0 ? code : 2);
    }
}

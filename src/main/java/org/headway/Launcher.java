package org.headway;

import org.headway.cli.HeadwayCommand;

/**
 * Entry point of {@code headway.jar}. Not a JavaFX {@code Application}, so that the fat jar starts
 * without the JavaFX module path; it runs the command line, and will open the desktop window when
 * started without arguments on a machine with a display.
 */
public final class Launcher {

    private Launcher() {}

    public static void main(String[] args) {
        System.exit(HeadwayCommand.run(args));
    }
}

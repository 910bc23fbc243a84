package io.github.eigengate.cli;

import java.nio.file.Files;
import java.nio.file.Path;

/** Whether stderr is a terminal, which the JDK does not say directly. */
final class Terminal {

    private Terminal() {
    }

    static boolean stderrIsTerminal() {
        // Linux: fd 2 links to the terminal device (also when stdout is redirected); elsewhere a console on
        // stdin/stdout is the best sign there is
        Path fd2 = Path.of("/proc/self/fd/2");
        if (Files.exists(fd2)) {
            try {
                String target = Files.readSymbolicLink(fd2).toString();
                return target.startsWith("/dev/pts/") || target.startsWith("/dev/tty");
            } catch (java.io.IOException | UnsupportedOperationException e) {
                return false;
            }
        }
        return System.console() != null;
    }
}

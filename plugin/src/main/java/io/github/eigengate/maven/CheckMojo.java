package io.github.eigengate.maven;

import org.apache.maven.plugin.AbstractMojo;
import org.apache.maven.plugins.annotations.LifecyclePhase;
import org.apache.maven.plugins.annotations.Mojo;

/** Checks the datasets of a modular-forms repository (placeholder while the gate is built). */
@Mojo(name = "check", defaultPhase = LifecyclePhase.VERIFY, threadSafe = true)
public final class CheckMojo extends AbstractMojo {
    @Override
    public void execute() {
        getLog().info("eigengate: nothing checked yet");
    }
}

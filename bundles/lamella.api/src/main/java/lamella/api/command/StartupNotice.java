package lamella.api.command;

import java.util.List;
import org.osgi.annotation.versioning.ConsumerType;

/**
 * A problem of the set-up that every command should mention as it starts, because it would otherwise go unnoticed
 * until a result is wrong or missing (a configured material library that is missing or broken, say). Offered as a
 * service; the dispatcher prints each line once on standard error before it runs a command.
 */
@ConsumerType
public interface StartupNotice {

    /**
     * One line per problem, in the trade's words, each naming the command that shows the details; empty when all is
     * well. Called once per command, so it may read what it checks.
     */
    List<String> notices();
}

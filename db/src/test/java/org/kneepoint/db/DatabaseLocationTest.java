package org.kneepoint.db;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.kneepoint.fitter.error.BadInputException;

/** Choosing the library and its credentials: option, then environment, then the home folder; passwords never shown. */
class DatabaseLocationTest {

    private static final Path HOME = Path.of("invented-home").toAbsolutePath();

    @Test
    void the_option_wins_then_the_environment_then_the_home_folder() {
        Map<String, String> environment = Map.of("KNEEPOINT_DB", "jdbc:postgresql://db.invented:5432/magnets");
        assertEquals("jdbc:h2:file:/tmp/lib/kneepoint", DatabaseLocation.resolve("/tmp/lib", environment, HOME).jdbcUrl());
        assertEquals("jdbc:postgresql://db.invented:5432/magnets", DatabaseLocation.resolve(null, environment, HOME).jdbcUrl());
        assertEquals("jdbc:h2:file:" + HOME.resolve(".kneepoint").resolve("kneepoint"), DatabaseLocation.resolve(" ", Map.of(), HOME).jdbcUrl());
    }

    @Test
    void the_home_folder_is_home_from_the_environment_before_the_accounts_own() {
        Path elsewhere = Path.of("invented-elsewhere").toAbsolutePath();
        assertEquals("jdbc:h2:file:" + elsewhere.resolve(".kneepoint").resolve("kneepoint"),
                DatabaseLocation.resolve(null, Map.of("HOME", elsewhere.toString()), HOME).jdbcUrl());
        assertEquals("jdbc:h2:file:" + HOME.resolve(".kneepoint").resolve("kneepoint"),
                DatabaseLocation.resolve(null, Map.of("HOME", ""), HOME).jdbcUrl(), "an empty HOME is no home");
    }

    @Test
    void credentials_come_from_the_environment_and_are_never_shown() {
        Map<String, String> environment = Map.of("KNEEPOINT_DB_USER", "team", "KNEEPOINT_DB_PASSWORD", "s3cret-pass");
        DatabaseLocation location = DatabaseLocation.resolve("jdbc:postgresql://db.invented/magnets", environment, HOME);
        assertEquals("team", location.user());
        assertEquals("s3cret-pass", location.password());
        assertEquals("jdbc:postgresql://db.invented/magnets (as team)", location.describe());
        assertFalse(location.toString().contains("s3cret"), location.toString());
    }

    @Test
    void a_password_in_the_db_option_is_refused_and_not_echoed() {
        var error = assertThrows(BadInputException.class,
                () -> DatabaseLocation.resolve("jdbc:postgresql://db.invented/magnets?user=team&password=s3cret-pass", Map.of(), HOME));
        assertTrue(error.getMessage().contains("set KNEEPOINT_DB_PASSWORD instead"), error.getMessage());
        assertFalse(error.getMessage().contains("s3cret"), error.getMessage());
    }

    @Test
    void a_password_in_the_environment_url_is_taken_out_of_the_url_and_never_shown() {
        DatabaseLocation location = DatabaseLocation.resolve(null,
                Map.of("KNEEPOINT_DB", "jdbc:postgresql://db.invented/magnets?user=team&password=s3cret%2Dpass&ssl=true"), HOME);
        assertEquals("jdbc:postgresql://db.invented/magnets?user=team&ssl=true", location.describe());
        assertEquals("s3cret-pass", location.password(), "percent-decoded as the driver would read it");
        DatabaseLocation h2 = DatabaseLocation.resolve(null, Map.of("KNEEPOINT_DB", "jdbc:h2:file:/tmp/x/kneepoint;user=kp;PASSWORD=s3cret"), HOME);
        assertEquals("jdbc:h2:file:/tmp/x/kneepoint (as kp)", h2.describe());
        assertEquals("s3cret", h2.password());
        assertNull(DatabaseLocation.resolve(null, Map.of("KNEEPOINT_DB", "jdbc:h2:mem:x"), HOME).password());
    }

    @Test
    void anything_but_a_folder_or_a_known_url_is_refused_without_echoing_a_password() {
        var error = assertThrows(BadInputException.class, () -> new DatabaseLocation("jdbc:mysql://x/y?password=hunter2"));
        assertFalse(error.getMessage().contains("hunter2"), error.getMessage());
        assertTrue(error.getMessage().contains("jdbc:h2: or jdbc:postgresql:"), error.getMessage());
    }
}

package org.tracegas.store.internal;

import java.io.IOException;
import java.io.InputStream;
import java.io.Reader;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import javax.sql.DataSource;

import org.flywaydb.core.Flyway;
import org.flywaydb.core.api.ClassProvider;
import org.flywaydb.core.api.ResourceProvider;
import org.flywaydb.core.api.migration.JavaMigration;
import org.flywaydb.core.api.output.MigrateResult;
import org.flywaydb.core.api.resource.LoadableResource;

/**
 * Brings the schema to the current version with Flyway.
 * <p>
 * Flyway normally finds migrations by scanning class-path locations. Inside OSGi that scan cannot see
 * into this bundle (Flyway's bundle class loader does not know it, and bundle URLs are not file or jar
 * URLs), so the migrations are handed over explicitly: a {@link ResourceProvider} that serves the SQL
 * files listed in {@link #SCRIPTS} from this bundle, an empty Java migration class provider, which together
 * switch Flyway's scanner off, and the Java migrations as instances made here, since Flyway's class loader
 * cannot load classes of this bundle. Flyway is given its own class loader because it finds its database
 * support (PostgreSQL, H2) through {@link java.util.ServiceLoader} files inside its own bundle. The same
 * code runs unchanged outside OSGi.
 * <p>
 * Flyway 9.22 loads all of its plugins at once, and two of them (JSON report readers) are Gson classes:
 * Gson (com.google.gson 2.10.1) must be present at run time or Flyway fails to start, and since the
 * flyway-core manifest does not import com.google.gson, OSGi needs a fragment of org.flywaydb.core that does.
 */
final class Migrations {

    /** The migrations, oldest first; add new files here. */
    static final List<String> SCRIPTS = List.of("V1__workspace_schema.sql", "V2__qa_checks.sql",
            "V3__work_units.sql", "V4__work_batch_method_version.sql", "V6__data_binding.sql",
            "V20__imported_files.sql", "V21__result_conditions.sql", "V22__sites_sources_instruments.sql",
            "V23__reports.sql");

    /** Migrations that plain SQL cannot write for H2 and PostgreSQL alike; add new ones here. */
    static JavaMigration[] javaMigrations() {
        return new JavaMigration[] { new V5__work_unit_failed(), new V24__spectrum_sequence_cache(),
            new V25__measurement_lookups() };
    }

    private Migrations() {
    }

    /** @return the number of migrations applied now (0 when the schema was current) */
    static int migrate(DataSource dataSource) {
        MigrateResult result = Flyway.configure(Flyway.class.getClassLoader())
                .dataSource(dataSource)
                .resourceProvider(new BundleScripts())
                .javaMigrationClassProvider(new NoJavaMigrationClasses())
                .javaMigrations(javaMigrations())
                .table("schema_history")
                .load()
                .migrate();
        return result.migrationsExecuted;
    }

    private static final class NoJavaMigrationClasses implements ClassProvider<JavaMigration> {
        @Override
        public Collection<Class<? extends JavaMigration>> getClasses() {
            return List.of();
        }
    }

    private static final class BundleScripts implements ResourceProvider {

        @Override
        public LoadableResource getResource(String name) {
            return SCRIPTS.contains(name) ? new Script(name) : null;
        }

        @Override
        public Collection<LoadableResource> getResources(String prefix, String[] suffixes) {
            List<LoadableResource> found = new ArrayList<>();
            for (String name : SCRIPTS) {
                if (name.startsWith(prefix)) {
                    for (String suffix : suffixes) {
                        if (name.endsWith(suffix)) {
                            found.add(new Script(name));
                            break;
                        }
                    }
                }
            }
            return found;
        }
    }

    /** One SQL file beside this class, read whole (the scripts are small). */
    private static final class Script extends LoadableResource {

        private final String name;

        Script(String name) {
            this.name = name;
        }

        @Override
        public Reader read() {
            try (InputStream in = Migrations.class.getResourceAsStream(name)) {
                if (in == null) {
                    throw new IllegalStateException("migration " + name + " is missing from the bundle");
                }
                return new StringReader(new String(in.readAllBytes(), StandardCharsets.UTF_8));
            } catch (IOException e) {
                throw new IllegalStateException("cannot read migration " + name, e);
            }
        }

        @Override
        public String getAbsolutePath() {
            return Migrations.class.getPackageName().replace('.', '/') + "/" + name;
        }

        @Override
        public String getAbsolutePathOnDisk() {
            return null;
        }

        @Override
        public String getFilename() {
            return name;
        }

        @Override
        public String getRelativePath() {
            return name;
        }
    }
}

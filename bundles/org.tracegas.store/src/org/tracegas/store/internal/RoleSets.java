package org.tracegas.store.internal;

import java.util.Collection;
import java.util.EnumSet;
import java.util.Set;
import java.util.stream.Collectors;

import org.tracegas.model.Role;

/** Roles as stored: names separated by commas, in declaration order. */
final class RoleSets {

    private RoleSets() {
    }

    static String format(Collection<Role> roles) {
        return EnumSet.copyOf(roles).stream().map(Role::getName).collect(Collectors.joining(","));
    }

    static Set<Role> parse(String text) {
        EnumSet<Role> roles = EnumSet.noneOf(Role.class);
        for (String name : text.split(",")) {
            if (!name.isEmpty()) {
                roles.add(Role.valueOf(name));
            }
        }
        return roles;
    }
}

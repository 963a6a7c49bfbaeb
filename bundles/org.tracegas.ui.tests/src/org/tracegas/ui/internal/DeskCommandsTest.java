package org.tracegas.ui.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.eclipse.core.commands.IHandler;
import org.eclipse.core.runtime.IConfigurationElement;
import org.eclipse.core.runtime.Platform;
import org.eclipse.ui.IPageLayout;
import org.junit.jupiter.api.Test;

/**
 * The desk's commands as the workbench reads them from plugin.xml: each has a handler that loads, a key
 * binding of its own, and a place in the File or Analysis menu; the Window menu's views all offer a shortcut.
 */
class DeskCommandsTest {

    private static final String UI = "org.tracegas.ui";

    private static List<IConfigurationElement> ours(String point) {
        List<IConfigurationElement> all = new ArrayList<>();
        for (IConfigurationElement e : Platform.getExtensionRegistry().getConfigurationElementsFor(point)) {
            if (UI.equals(e.getContributor().getName())) {
                all.add(e);
            }
        }
        return all;
    }

    private static Set<String> commandIds() {
        Set<String> ids = new HashSet<>();
        for (IConfigurationElement e : ours("org.eclipse.ui.commands")) {
            if ("command".equals(e.getName())) {
                ids.add(e.getAttribute("id"));
            }
        }
        return ids;
    }

    @Test
    void everyCommandHasAHandlerThatLoadsAndAKeyOfItsOwn() throws Exception {
        Set<String> commands = commandIds();
        assertEquals(Set.of("org.tracegas.ui.commands.import", "org.tracegas.ui.commands.exportResults",
                "org.tracegas.ui.commands.runMethod", "org.tracegas.ui.commands.report",
                "org.tracegas.ui.commands.reviewAndSign"), commands);
        Set<String> handled = new HashSet<>();
        for (IConfigurationElement h : ours("org.eclipse.ui.handlers")) {
            assertInstanceOf(IHandler.class, h.createExecutableExtension("class"), h.getAttribute("commandId"));
            handled.add(h.getAttribute("commandId"));
        }
        assertEquals(commands, handled);
        Map<String, String> keys = new HashMap<>();
        for (IConfigurationElement k : ours("org.eclipse.ui.bindings")) {
            String before = keys.put(k.getAttribute("sequence"), k.getAttribute("commandId"));
            assertEquals(null, before, "two commands on " + k.getAttribute("sequence"));
        }
        assertEquals(commands, new HashSet<>(keys.values()));
        // Ctrl+R runs, Ctrl+Shift+S signs: shown in the toolbar's tool tips
        assertEquals("org.tracegas.ui.commands.runMethod", keys.get("M1+R"));
        assertEquals("org.tracegas.ui.commands.reviewAndSign", keys.get("M1+M2+S"));
    }

    @Test
    void theFileAndAnalysisMenusOfferTheCommands() {
        Map<String, List<String>> menus = new HashMap<>();
        for (IConfigurationElement c : ours("org.eclipse.ui.menus")) {
            String location = c.getAttribute("locationURI");
            for (IConfigurationElement child : c.getChildren()) {
                String where = "menu".equals(child.getName()) ? child.getAttribute("label") : location;
                for (IConfigurationElement item : "menu".equals(child.getName()) ? child.getChildren("command")
                        : new IConfigurationElement[] {child}) {
                    if (item.getAttribute("commandId") != null) {
                        menus.computeIfAbsent(where, k -> new ArrayList<>()).add(item.getAttribute("commandId"));
                    }
                }
            }
        }
        assertEquals(List.of("org.tracegas.ui.commands.import", "org.tracegas.ui.commands.exportResults"),
                menus.get("menu:file?after=additions"));
        assertEquals(List.of("org.tracegas.ui.commands.runMethod", "org.tracegas.ui.commands.report",
                "org.tracegas.ui.commands.reviewAndSign"), menus.get("&Analysis"));
    }

    @Test
    void everyViewCanBeShownFromTheWindowMenuOfBothDesks() {
        Set<String> views = new HashSet<>();
        for (IConfigurationElement v : ours("org.eclipse.ui.views")) {
            if ("view".equals(v.getName())) {
                views.add(v.getAttribute("id"));
            }
        }
        // the platform's Properties view, which shows the tree's selection through the model's item providers
        views.add(IPageLayout.ID_PROP_SHEET);
        int desks = 0;
        for (IConfigurationElement p : ours("org.eclipse.ui.perspectiveExtensions")) {
            Set<String> shortcuts = new HashSet<>();
            for (IConfigurationElement s : p.getChildren("viewShortcut")) {
                shortcuts.add(s.getAttribute("id"));
            }
            assertEquals(views, shortcuts, p.getAttribute("targetID"));
            desks++;
        }
        assertEquals(2, desks);
    }
}

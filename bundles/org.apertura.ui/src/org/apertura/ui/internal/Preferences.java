/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.internal;

import org.apertura.ui.viewer.Palette;
import org.eclipse.core.runtime.preferences.InstanceScope;
import org.eclipse.jface.preference.IPreferenceStore;
import org.eclipse.ui.preferences.ScopedPreferenceStore;

/** The workbench's preferences: keys, defaults and typed accessors. */
public final class Preferences {

    /** Name of the layout viewer's palette ({@link Palette#named(String)}). */
    public static final String PALETTE = "viewer.palette";
    /** Threads for checks and migrations; 0 means one per processor. */
    public static final String THREADS = "engine.threads";
    /** The option a new check or migration starts from, by name (empty: the deck's first). */
    public static final String SOURCE_OPTION = "option.source";
    /** The option a new migration moves to, by name (empty: the deck's last). */
    public static final String TARGET_OPTION = "option.target";
    /** Who signs waivers made in the workbench. */
    public static final String REVIEWER = "review.author";

    private static ScopedPreferenceStore store;

    private Preferences() {
    }

    /** The preference store of the org.apertura.ui bundle, with defaults set. */
    public static synchronized IPreferenceStore store() {
        if (store == null) {
            store = new ScopedPreferenceStore(InstanceScope.INSTANCE, "org.apertura.ui");
            store.setDefault(PALETTE, Palette.HARBOUR.name());
            store.setDefault(THREADS, 0);
            store.setDefault(SOURCE_OPTION, "");
            store.setDefault(TARGET_OPTION, "");
            store.setDefault(REVIEWER, System.getProperty("user.name", "reviewer"));
        }
        return store;
    }

    public static Palette palette() {
        return Palette.named(store().getString(PALETTE));
    }

    /** Worker threads for the engine: the preference, or the number of processors when it is 0. */
    public static int threads() {
        int t = store().getInt(THREADS);
        return t > 0 ? t : Runtime.getRuntime().availableProcessors();
    }

    public static String reviewer() {
        return store().getString(REVIEWER);
    }
}

/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.waiver;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.apertura.report.model.Finding;
import org.apertura.report.model.ReportData;
import org.apertura.report.model.Waiver;

/** Matches waivers to findings; the rules are in the {@linkplain org.apertura.report.waiver package} javadoc. */
public final class Waivers {

    /** Largest difference per box coordinate, in nm, for a waiver's box to match a finding's marker. */
    public static final double BOX_TOLERANCE_NM = 0.001;

    private Waivers() {
    }

    /** True when {@code w} covers {@code f}: same rule and layer, and same box or same fingerprint. */
    public static boolean matches(Waiver w, Finding f) {
        if (!w.rule().equals(f.ruleId()) || !w.layer().equals(f.layer())) {
            return false;
        }
        return w.box().map(b -> b.sameAs(f.marker(), BOX_TOLERANCE_NM)).orElse(false)
                || w.fingerprint().map(fp -> fp.equals(f.fingerprint())).orElse(false);
    }

    /**
     * The report with each present finding covered by its first matching waiver (earlier waivers on findings
     * are replaced) and with the waivers that match no present finding as stale waivers.
     */
    public static ReportData apply(ReportData data, List<Waiver> waivers) {
        Map<String, List<Waiver>> byRuleLayer = new HashMap<>();
        for (Waiver w : waivers) {
            byRuleLayer.computeIfAbsent(w.rule() + '\u0000' + w.layer(), k -> new ArrayList<>()).add(w);
        }
        Map<Waiver, Boolean> used = new IdentityHashMap<>();
        List<Finding> out = new ArrayList<>(data.findings().size());
        for (Finding f : data.findings()) {
            Optional<Waiver> cover = Optional.empty();
            if (f.status().present()) {
                for (Waiver w : byRuleLayer.getOrDefault(f.ruleId() + '\u0000' + f.layer(), List.of())) {
                    if (matches(w, f)) {
                        used.put(w, true);
                        if (cover.isEmpty()) {
                            cover = Optional.of(w);
                        }
                    }
                }
            }
            out.add(f.withWaiver(cover));
        }
        List<Waiver> stale = waivers.stream().filter(w -> !used.containsKey(w)).toList();
        return data.withFindings(out, stale);
    }
}

/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.internal;

/** Text escaping for HTML that is also well-formed XML. */
public final class Html {

    private Html() {
    }

    /** Escapes {@code & < > " '} so the text is safe in element content and in quoted attributes. */
    public static String esc(String s) {
        StringBuilder sb = new StringBuilder(s.length() + 16);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
            case '&' -> sb.append("&amp;");
            case '<' -> sb.append("&lt;");
            case '>' -> sb.append("&gt;");
            case '"' -> sb.append("&quot;");
            case '\'' -> sb.append("&#39;");
            default -> {
                // XML 1.0 forbids most control characters even as references
                if (c < 0x20 && c != '\n' && c != '\t' && c != '\r') {
                    sb.append('\uFFFD');
                } else {
                    sb.append(c);
                }
            }
            }
        }
        return sb.toString();
    }
}

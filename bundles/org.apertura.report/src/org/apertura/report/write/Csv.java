/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.write;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

/**
 * CSV as RFC 4180 describes it: records end in CRLF, a field holding a comma, a double quote, CR or LF (or
 * leading/trailing blanks) is enclosed in double quotes and its quotes are doubled. The reader accepts LF or
 * CRLF line ends and reports malformed quoting with the record number and column.
 */
public final class Csv {

    private Csv() {
    }

    /** One record, with its CRLF. */
    public static String record(List<String> fields) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < fields.size(); i++) {
            if (i > 0) {
                sb.append(',');
            }
            sb.append(field(fields.get(i)));
        }
        return sb.append("\r\n").toString();
    }

    /** One field, quoted when needed. */
    public static String field(String s) {
        if (s == null) {
            return "";
        }
        boolean quote = s.indexOf(',') >= 0 || s.indexOf('"') >= 0 || s.indexOf('\n') >= 0 || s.indexOf('\r') >= 0
                || (!s.isEmpty() && (Character.isWhitespace(s.charAt(0))
                        || Character.isWhitespace(s.charAt(s.length() - 1))));
        return quote ? '"' + s.replace("\"", "\"\"") + '"' : s;
    }

    /** Parses CSV text into records of fields. A final line end is optional; an empty text has no records. */
    public static List<List<String>> parse(String text) throws IOException {
        List<List<String>> records = new ArrayList<>();
        List<String> rec = new ArrayList<>();
        StringBuilder f = new StringBuilder();
        int i = 0;
        int line = 1;
        int col = 1;
        boolean quoted = false;
        boolean fieldStart = true;
        boolean afterQuote = false;
        while (i < text.length()) {
            char c = text.charAt(i);
            if (quoted) {
                if (c == '"') {
                    if (i + 1 < text.length() && text.charAt(i + 1) == '"') {
                        f.append('"');
                        i += 2;
                        col += 2;
                        continue;
                    }
                    quoted = false;
                    afterQuote = true;
                } else {
                    f.append(c);
                    if (c == '\n') {
                        line++;
                        col = 0;
                    }
                }
            } else if (c == ',') {
                rec.add(f.toString());
                f.setLength(0);
                fieldStart = true;
                afterQuote = false;
                i++;
                col++;
                continue;
            } else if (c == '\r' || c == '\n') {
                if (c == '\r' && i + 1 < text.length() && text.charAt(i + 1) == '\n') {
                    i++;
                }
                rec.add(f.toString());
                f.setLength(0);
                records.add(rec);
                rec = new ArrayList<>();
                fieldStart = true;
                afterQuote = false;
                i++;
                line++;
                col = 1;
                continue;
            } else if (c == '"' && fieldStart) {
                quoted = true;
            } else if (afterQuote) {
                throw new IOException("line " + line + ", column " + col + ": text after a closing quote");
            } else if (c == '"') {
                throw new IOException("line " + line + ", column " + col + ": quote inside an unquoted field");
            } else {
                f.append(c);
            }
            fieldStart = false;
            i++;
            col++;
        }
        if (quoted) {
            throw new IOException("line " + line + ", column " + col + ": unterminated quoted field");
        }
        if (!fieldStart || !rec.isEmpty() || f.length() > 0) {
            rec.add(f.toString());
            records.add(rec);
        }
        return records;
    }
}

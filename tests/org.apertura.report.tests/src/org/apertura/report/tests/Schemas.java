/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.tests;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.networknt.schema.JsonSchema;
import com.networknt.schema.JsonSchemaFactory;
import com.networknt.schema.SchemaValidatorsConfig;
import com.networknt.schema.SpecVersion;
import com.networknt.schema.ValidationMessage;

/** JSON-schema validation with a general-purpose validator (com.networknt:json-schema-validator). */
public final class Schemas {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    private Schemas() {
    }

    /**
     * The published SARIF 2.1.0 schema (OASIS SARIF TC, sarif-schema-2.1.0.json, JSON Schema draft-04), kept
     * in shared/data/sarif.
     */
    public static Path sarifSchema() {
        return Path.of(System.getProperty("apertura.root", "/work/main"))
                .resolve("../shared/data/sarif/sarif-schema-2.1.0.json").normalize();
    }

    /** Validation messages of {@code json} against a draft-04 schema file. */
    public static List<String> validateDraft4(Path schema, String json) throws IOException {
        try (InputStream in = Files.newInputStream(schema)) {
            return validate(SpecVersion.VersionFlag.V4, in, json);
        }
    }

    /** Validation messages of {@code json} against a draft-07 schema. */
    public static List<String> validateDraft7(InputStream schema, String json) throws IOException {
        return validate(SpecVersion.VersionFlag.V7, schema, json);
    }

    private static List<String> validate(SpecVersion.VersionFlag version, InputStream schema, String json)
            throws IOException {
        JsonNode schemaNode = MAPPER.readTree(schema);
        SchemaValidatorsConfig config = SchemaValidatorsConfig.builder().formatAssertionsEnabled(true).build();
        JsonSchema s = JsonSchemaFactory.getInstance(version).getSchema(schemaNode, config);
        Set<ValidationMessage> errors = s.validate(MAPPER.readTree(json));
        return errors.stream().map(ValidationMessage::getMessage).sorted().toList();
    }

    /** Parses JSON text with Jackson (an independent reader). */
    public static JsonNode tree(String json) throws IOException {
        return MAPPER.readTree(json);
    }
}

/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Value types shared by the layout model and its tools: {@link org.apertura.layout.PointList} (the
 * point lists of the model, in database units) and {@link org.apertura.layout.LayerKey} (layer and
 * datatype). The model itself is generated into {@code org.apertura.layout.model} from
 * {@code model/layout.ecore}.
 */
package org.apertura.layout;

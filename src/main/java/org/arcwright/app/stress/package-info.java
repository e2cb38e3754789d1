/** The Stress view: Kt and Kf against the fillet radius, the tolerance band, the smallest radius for a target. */
package org.arcwright.app.stress;

/** The Zone view: the nominal blend, the zone its control allows, magnified deviations, zoom and pan. */
package org.arcwright.app.zoneview;

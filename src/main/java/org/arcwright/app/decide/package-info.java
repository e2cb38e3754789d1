/**
 * The Decide panel: the guided form for one radius's case, the limits of the tolerance intent as
 * you type, and the recommendations as ranked cards to choose from.
 */
package org.arcwright.app.decide;

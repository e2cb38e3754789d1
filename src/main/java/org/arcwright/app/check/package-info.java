/** The Check panel: import a measured contour, run the inspection off the UI thread, show the verdict. */
package org.arcwright.app.check;

/** The Part panel: the worksheet's radius features in a table, with add, duplicate and delete. */
package org.arcwright.app.part;

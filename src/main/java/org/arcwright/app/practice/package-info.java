/** The Practice editor: the rules of the active packs, checked as you type, and each pack's examples run in one click. */
package org.arcwright.app.practice;

/**
 * Accounts, roles, sign-in, browser sessions, CSRF and personal API tokens. Used by every
 * other module to learn who is asking.
 */
package org.assay.accounts;

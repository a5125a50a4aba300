/**
 * JSON output shared by the commands: {@link org.bracewalk.app.json.PrettyJson} prints Jackson trees
 * in one stable, readable layout. Depends on Jackson only.
 */
package org.bracewalk.app.json;

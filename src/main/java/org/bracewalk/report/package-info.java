/** PDF rendering of inspection reports and repair orders with OpenPDF; wording from templates/. */
package org.bracewalk.report;

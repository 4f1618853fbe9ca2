/**
 * Values for the inspector: span (base tangent length), measurement over pins or balls with the pin
 * choice, chordal thickness and height. Every value is for the thinned tooth: the thickness allowance
 * enters as the profile shift x_E = x + E_sn / (2 m_n tan α_n).
 */
package org.hobwright.wizard.inspection;

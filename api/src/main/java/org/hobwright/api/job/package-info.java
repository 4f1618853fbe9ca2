/**
 * Job input: the gear, the hob, the machine profile and the cycle settings, in canonical units
 * (mm, degrees, rpm, seconds). Signed angles: right hand positive.
 */
package org.hobwright.api.job;

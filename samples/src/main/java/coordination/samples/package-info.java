/** Examples of the library API, built on the Riverside water-treatment works scenario of the sample studies. */
package coordination.samples;

/** Implementation helpers of the core module; not exported and not part of the API. */
package coordination.core.internal;

package org.resonancegate.dynamics;

import java.util.Optional;
import org.resonancegate.spec.Axis;

/**
 * One force-carrying row of an element: a spring along a line, or one axis of a mount.
 *
 * @param element index of the spring or mount in listing order
 * @param axis    the mount axis; empty for a spring along a line
 * @param label   how a message names it; empty when the model has only one element row
 */
public record ElementRow(int element, Optional<Axis> axis, String label) {
}

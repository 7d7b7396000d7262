import * as clipper2 from 'clipper2-ts';

/**
 * The polygon library (clipper2-ts), reached through this one function so that a bundle can load
 * it only when an outline is first asked for: the command line's build puts it in a file of its
 * own, since most moulds never need it (see docker-free-scripts/build.mjs).
 */
export function polygonLibrary(): typeof clipper2 {
  return clipper2;
}

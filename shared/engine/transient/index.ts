/** Transient thermal behaviour: Laplace inversion, Foster networks, profiles and timing (physics.md §3). */
export { stehfestAbscissae, stehfestCombine, stehfestInvert, stehfestWeights, STEHFEST_TERMS } from './stehfest';
export { talbotInvert, TALBOT_NODES, type Complex } from './talbot';

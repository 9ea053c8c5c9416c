import type { Network, Project, User } from '~~/server/database/models'
import type { NetworkDto, NetworkSummaryDto, ProjectDto, ProjectRole, UserDto } from '#shared/types/api'

/** Plain DTOs for the API; model instances never leave the server. */
export function toUserDto(user: User): UserDto {
  return { id: user.id, email: user.email, name: user.name, isAdmin: user.isAdmin }
}

export function toProjectDto(project: Project, role: ProjectRole): ProjectDto {
  return {
    id: project.id,
    name: project.name,
    description: project.description,
    role,
    createdAt: project.createdAt.toISOString(),
    updatedAt: project.updatedAt.toISOString(),
  }
}

export function toNetworkSummaryDto(network: Network): NetworkSummaryDto {
  return {
    id: network.id,
    projectId: network.projectId,
    name: network.name,
    revision: network.revision,
    updatedAt: network.updatedAt.toISOString(),
    updatedBy: network.updatedBy,
  }
}

export function toNetworkDto(network: Network, role: ProjectRole): NetworkDto {
  return { ...toNetworkSummaryDto(network), document: network.document, role }
}

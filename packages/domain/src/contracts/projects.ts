import { z } from "zod";
import { createProjectInput, projectDto } from "./bookings.ts";
import { idParams } from "./common.ts";
import { defineRoute } from "./route.ts";

/** Projects (albums, EPs, singles) belong to a client account. */
export const projectRoutes = {
  list: defineRoute({
    method: "get",
    path: "/api/clients/:id/projects",
    summary: "A client's projects (a client sees only its own)",
    access: ["owner", "manager", "bookkeeper", "engineer", "client"],
    params: idParams,
    response: z.array(projectDto),
  }),
  create: defineRoute({
    method: "post",
    path: "/api/clients/:id/projects",
    summary: "Add a project (album, EP, single) for a client",
    access: ["owner", "manager"],
    params: idParams,
    body: createProjectInput,
    status: 201,
    response: projectDto,
  }),
};

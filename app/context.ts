import { createContext } from "react-router";
import type { Db } from "./db/client.server";

// What every loader and action can reach through the router context.
export const dbContext = createContext<Db>();

import { installZodMessages } from '../../shared/schemas/zodMessages'

// Schema messages in the user's words on the server too: the bundler keeps this call, while
// it drops the shared schemas' bare `import './zodMessages'`.
export default defineNitroPlugin(() => {
  installZodMessages()
})

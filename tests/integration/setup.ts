// Each integration test file gets a fresh database with the migrations applied: an in-memory PGlite,
// or — when TEST_DATABASE_URL names a PostgreSQL server — a new database created on it and dropped after.
import { afterAll, beforeAll } from 'vitest'
import { closeDb, getDb } from '@/db/client'

const adminUrl = process.env.TEST_DATABASE_URL
let dbName: string | undefined

beforeAll(async () => {
  if (adminUrl) {
    const { Client } = await import('pg')
    dbName = `mw_test_${process.pid}_${Math.random().toString(36).slice(2, 8)}`
    const c = new Client({ connectionString: adminUrl })
    await c.connect()
    await c.query(`create database ${dbName}`)
    await c.end()
    const url = new URL(adminUrl)
    url.pathname = `/${dbName}`
    process.env.DATABASE_URL = url.toString()
    process.env.PG_POOL_MAX = '20'
  } else {
    delete process.env.DATABASE_URL
    process.env.PGLITE_DATA_DIR = 'memory://'
  }
  await getDb()
})

afterAll(async () => {
  await closeDb()
  if (adminUrl && dbName) {
    const { Client } = await import('pg')
    const c = new Client({ connectionString: adminUrl })
    await c.connect()
    await c.query(`drop database if exists ${dbName} with (force)`)
    await c.end()
  }
})

export * from './airflow';
export * from './blower-table';
